import type { CapturedMail } from '../../shared/schemas/dev-mail';

/** Waits for a captured e-mail to an address (optionally matching a subject) through GET /api/dev/mail. */
export async function waitForMail(
  fetchMails: () => Promise<CapturedMail[]>,
  to: string,
  subject: RegExp = /.*/,
  timeoutMs = 10_000,
): Promise<CapturedMail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await fetchMails()).find((m) => m.to.toLowerCase() === to.toLowerCase() && subject.test(m.subject));
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`No e-mail to ${to} matching ${subject} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

/** The token at the end of the first link in a message that contains `/<path>/`. */
export function tokenFrom(mail: CapturedMail, path: string): string {
  const match = mail.text.match(new RegExp(`/${path}/([A-Za-z0-9_-]+)`));
  if (!match) throw new Error(`No /${path}/<token> link in: ${mail.text}`);
  return match[1]!;
}
