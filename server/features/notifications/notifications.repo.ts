import { and, desc, eq, inArray, isNull, lt, sql } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { comments, findings, memberships, notifications, photos } from '../../db/schema';
import { notificationJoins, notificationVisible } from '../visibility/notification-visibility';

export type NewNotification = typeof notifications.$inferInsert;

export function notificationsRepo(db: Executor) {
  return {
    async insert(rows: NewNotification[]) {
      if (rows.length) await db.insert(notifications).values(rows);
    },
    /** Members of a restoration with the given roles. */
    async membersWithRole(restorationId: number, roles: string[]) {
      const rows = await db
        .select({ userId: memberships.userId, role: memberships.role })
        .from(memberships)
        .where(and(eq(memberships.restorationId, restorationId), inArray(memberships.role, roles as never[])));
      return rows;
    },
    /** The person's notifications that they may still see (the rule is applied as they are read), newest first
     * (ids grow with time); `beforeId` continues after a page's last item. */
    listFor(userId: number, limit = 50, beforeId?: number) {
      return db
        .select({ n: notifications, photoId: findings.photoId })
        .from(notifications)
        .leftJoin(findings, notificationJoins.finding)
        .leftJoin(photos, notificationJoins.photo)
        .innerJoin(memberships, notificationJoins.membership)
        .leftJoin(comments, notificationJoins.comment)
        .where(
          and(
            eq(notifications.userId, userId),
            notificationVisible,
            beforeId ? lt(notifications.id, beforeId) : undefined,
          ),
        )
        .orderBy(desc(notifications.id))
        .limit(limit);
    },
    async markRead(userId: number, ids?: number[]) {
      await db
        .update(notifications)
        .set({ readAt: sql`now()` })
        .where(
          and(
            eq(notifications.userId, userId),
            isNull(notifications.readAt),
            ids ? inArray(notifications.id, ids) : undefined,
          ),
        );
    },
  };
}
