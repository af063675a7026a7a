import { and, eq, inArray, isNull, sql } from 'drizzle-orm';
import { notificationPath } from '../../../shared/schemas/notifications';
import type { AppDeps } from '../../app-deps';
import { comments, findings, memberships, notifications, photos, users } from '../../db/schema';
import { notificationJoins, notificationVisible } from '../visibility/notification-visibility';

const MAIL_LOCK = 5180002;

type Claimed = {
  person: { id: number; email: string; name: string };
  items: { id: number; summary: string; findingId: number | null; restorationId: number; photoId: number | null }[];
};

/**
 * Claims what is due, per person, and commits the claim before anything is sent. Rows are taken with SKIP
 * LOCKED and a per-person advisory lock, and the window is measured from the person's last claim, so several
 * instances flushing together never take the same item nor mail one person twice within the window.
 */
async function claimDue(deps: Pick<AppDeps, 'db' | 'config'>, now: Date): Promise<Claimed[]> {
  const windowMs = deps.config.notificationWindowSeconds * 1000;
  return deps.db.transaction(async (tx) => {
    const pending = await tx
      .select({
        id: notifications.id,
        userId: notifications.userId,
        summary: notifications.summary,
        findingId: notifications.findingId,
        restorationId: notifications.restorationId,
        photoId: findings.photoId,
      })
      .from(notifications)
      .leftJoin(findings, eq(findings.id, notifications.findingId))
      .where(and(isNull(notifications.mailClaimedAt), isNull(notifications.emailedAt), isNull(notifications.readAt)))
      .orderBy(notifications.id)
      .for('update', { of: notifications, skipLocked: true });
    if (!pending.length) return [];
    const userIds = [...new Set(pending.map((p) => p.userId))];
    const people = await tx
      .select({ id: users.id, email: users.email, name: users.name })
      .from(users)
      .where(inArray(users.id, userIds));
    const claimed: Claimed[] = [];
    for (const person of people) {
      const [lock] = await tx
        .execute<{ ok: boolean }>(sql`select pg_try_advisory_xact_lock(${MAIL_LOCK}, ${person.id}) as ok`)
        .then((r) => r.rows);
      if (!lock?.ok) continue;
      const [last] = await tx
        .select({
          at: sql<Date | null>`greatest(max(${notifications.mailClaimedAt}), max(${notifications.emailedAt}))`.mapWith(
            notifications.emailedAt,
          ),
        })
        .from(notifications)
        .where(eq(notifications.userId, person.id));
      if (last?.at && now.getTime() - last.at.getTime() < windowMs) continue;
      // Judged at send time: an item its reader may no longer see (unshared since) is not mailed, and stays unsent.
      const mine = pending.filter((p) => p.userId === person.id);
      const readable = await tx
        .select({ id: notifications.id })
        .from(notifications)
        .leftJoin(findings, notificationJoins.finding)
        .leftJoin(photos, notificationJoins.photo)
        .innerJoin(memberships, notificationJoins.membership)
        .leftJoin(comments, notificationJoins.comment)
        .where(
          and(
            inArray(
              notifications.id,
              mine.map((i) => i.id),
            ),
            notificationVisible,
          ),
        );
      const visibleIds = new Set(readable.map((r) => r.id));
      const items = mine.filter((i) => visibleIds.has(i.id));
      if (!items.length) continue;
      await tx
        .update(notifications)
        .set({ mailClaimedAt: now })
        .where(
          inArray(
            notifications.id,
            items.map((i) => i.id),
          ),
        );
      claimed.push({ person, items });
    }
    return claimed;
  });
}

/**
 * Sends each person one e-mail with everything new for them, at most once per batch window: the first
 * item goes at once, a burst after it waits for the window. Claim, commit, send, mark sent: a failure for
 * one person releases only that person's claim (tried again next tick) and never re-sends to the others.
 * A crash between sending and marking leaves the rows claimed and unsent: at most once, never twice.
 */
export async function flushNotificationMail(
  deps: Pick<AppDeps, 'db' | 'mailer' | 'config'>,
  now = new Date(),
): Promise<number> {
  const claimed = await claimDue(deps, now);
  let sent = 0;
  const failures: Error[] = [];
  for (const { person, items } of claimed) {
    const ids = items.map((i) => i.id);
    const lines = items.map((i) => `• ${i.summary}\n  ${deps.config.publicOrigin}${notificationPath(i)}`);
    try {
      await deps.mailer.send({
        to: person.email,
        subject:
          items.length === 1
            ? `Gridleak: ${items[0]!.summary.slice(0, 90)}`
            : `Gridleak: ${items.length} new items on your restorations`,
        text: `Hello ${person.name},\n\n${lines.join('\n\n')}\n\n— Gridleak, the restoration notebook`,
      });
    } catch (err) {
      await deps.db
        .update(notifications)
        .set({ mailClaimedAt: null })
        .where(and(inArray(notifications.id, ids), isNull(notifications.emailedAt)));
      failures.push(err as Error);
      continue;
    }
    await deps.db
      .update(notifications)
      .set({ emailedAt: sql`now()` })
      .where(inArray(notifications.id, ids));
    sent++;
  }
  if (failures.length)
    throw new Error(`${failures.length} of ${claimed.length} notification e-mails failed: ${failures[0]!.message}`);
  return sent;
}

const flushes = new WeakMap<object, { running: boolean; again: boolean }>();

/**
 * Asks for a flush without piling them up: at most one runs per app at a time, and a request made while it runs
 * starts one more afterwards. Many flushes at once would each hold a database connection while sending, and a
 * local SMTP capture that stores mail in the same database could then wait for a connection for ever.
 */
export function requestNotificationMail(
  deps: Pick<AppDeps, 'db' | 'mailer' | 'config'>,
  onError: (err: Error) => void,
): void {
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
