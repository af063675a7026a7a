import type { Page } from 'playwright-core';
import type { CapturedMail } from '../../shared/schemas/dev-mail';
import { waitForMail } from './mail';

export const DEMO_PASSWORD = 'valve-bench-demo';

/** Signs in through the sign-in page, as a person would. */
export async function signInAs(page: Page, origin: string, email: string, password = DEMO_PASSWORD) {
  await page.goto(`${origin}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  // The header follows the new session without a reload (on a phone its links and Sign out sit behind Menu).
  await page.getByRole('button', { name: /^Notifications/ }).waitFor();
  await page.getByRole('button', { name: 'Sign out', includeHidden: true }).waitFor({ state: 'attached' });
  await page
    .getByRole('navigation', { name: 'Main', includeHidden: true })
    .getByRole('link', { name: 'Calculators', includeHidden: true })
    .waitFor({ state: 'attached' });
}

/** Reads the product's mail capture for a message to `to`. */
export function mailTo(origin: string, to: string, subject?: RegExp): Promise<CapturedMail> {
  return waitForMail(
    async () => (await fetch(`${origin}/api/dev/mail`)).json() as Promise<CapturedMail[]>,
    to,
    subject,
  );
}

/** The first link in a captured message. */
export function firstLink(mail: CapturedMail): string {
  const link = mail.text.match(/https?:\/\/\S+/)?.[0];
  if (!link) throw new Error(`No link in: ${mail.text}`);
  return link;
}
