import { and, eq, inArray, isNull, max, sql } from 'drizzle-orm';
import { findingPath } from '../../../shared/schemas/findings';
import type { AppDeps } from '../../app-deps';
import { comments, findings, memberships, notifications, photos, users } from '../../db/schema';
import { notificationJoins, notificationVisible } from '../visibility/notification-visibility';

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
      // Judged at send time: an item its reader may no longer see (unshared since) is not mailed, and stays unsent.
      const mine = pending.filter((p) => p.userId === person.id);
      const readable = await tx
        .select({ id: notifications.id })
        .from(notifications)
        .innerJoin(findings, notificationJoins.finding)
        .innerJoin(photos, notificationJoins.photo)
        .innerJoin(memberships, notificationJoins.membership)
        .leftJoin(comments, notificationJoins.comment)
        .where(and(inArray(notifications.id, mine.map((i) => i.id)), notificationVisible));
      const ids = new Set(readable.map((r) => r.id));
      const items = mine.filter((i) => ids.has(i.id));
      if (!items.length) continue;
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
