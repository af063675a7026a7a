import { and, eq, inArray, isNull, max, sql } from 'drizzle-orm';
import { findingPath } from '../../../shared/schemas/findings';
import type { AppDeps } from '../../app-deps';
import { findings, notifications, users } from '../../db/schema';

const MAIL_LOCK = 5180002;

/**
 * Sends each person one e-mail with everything new for them, at most once per batch window: the first
 * item goes at once, a burst after it waits for the window. Rows are claimed with SKIP LOCKED inside a
 * transaction, so several instances flushing together never send the same item twice.
 */
export async function flushNotificationMail(deps: Pick<AppDeps, 'db' | 'mailer' | 'config'>, now = new Date()): Promise<number> {
  const windowMs = deps.config.notificationWindowSeconds * 1000;
  return deps.db.transaction(async (tx) => {
    const pending = await tx
      .select({ id: notifications.id, userId: notifications.userId, summary: notifications.summary, findingId: notifications.findingId,
        restorationId: notifications.restorationId, photoId: findings.photoId })
      .from(notifications)
      .innerJoin(findings, eq(findings.id, notifications.findingId))
      .where(and(isNull(notifications.emailedAt), isNull(notifications.readAt)))
      .orderBy(notifications.id)
      .for('update', { of: notifications, skipLocked: true });
    if (!pending.length) return 0;
    const userIds = [...new Set(pending.map((p) => p.userId))];
    const people = await tx.select({ id: users.id, email: users.email, name: users.name }).from(users).where(inArray(users.id, userIds));
    let sent = 0;
    for (const person of people) {
      // One flush at a time per person, so the window check sees the other's last e-mail.
      const [lock] = await tx.execute<{ ok: boolean }>(sql`select pg_try_advisory_xact_lock(${MAIL_LOCK}, ${person.id}) as ok`).then((r) => r.rows);
      if (!lock?.ok) continue;
      const [last] = await tx.select({ at: max(notifications.emailedAt) }).from(notifications).where(eq(notifications.userId, person.id));
      if (last?.at && now.getTime() - last.at.getTime() < windowMs) continue;
      const items = pending.filter((p) => p.userId === person.id);
      const lines = items.map((i) => `• ${i.summary}\n  ${deps.config.publicOrigin}${findingPath({ restorationId: i.restorationId, photoId: i.photoId, id: i.findingId })}`);
      await deps.mailer.send({
        to: person.email,
        subject: items.length === 1 ? `Gridleak: ${items[0]!.summary.slice(0, 90)}` : `Gridleak: ${items.length} new items on your restorations`,
        text: `Hello ${person.name},\n\n${lines.join('\n\n')}\n\n— Gridleak, the restoration notebook`,
      });
      await tx.update(notifications).set({ emailedAt: sql`now()` }).where(inArray(notifications.id, items.map((i) => i.id)));
      sent++;
    }
    return sent;
  });
}

const flushes = new WeakMap<object, { running: boolean; again: boolean }>();

/**
 * Asks for a flush without piling them up: at most one runs per app at a time, and a request made while it runs
 * starts one more afterwards. Many flushes at once would each hold a database connection while sending, and a
 * local SMTP capture that stores mail in the same database could then wait for a connection for ever.
 */
export function requestNotificationMail(deps: Pick<AppDeps, 'db' | 'mailer' | 'config'>, onError: (err: Error) => void): void {
  let state = flushes.get(deps.db);
  if (!state) flushes.set(deps.db, (state = { running: false, again: false }));
  if (state.running) {
    state.again = true;
    return;
  }
  const s = state;
  s.running = true;
  void (async () => {
    do {
      s.again = false;
      await flushNotificationMail(deps).catch(onError);
    } while (s.again);
    s.running = false;
  })();
}
