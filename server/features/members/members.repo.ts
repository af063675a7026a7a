import { and, eq } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Executor } from '../../db/client';
import { keyset, toMs, type PageWindow } from '../../db/keyset';
import { membershipRole } from '../../db/membership-role';
import { memberships, users } from '../../db/schema';

/** Members in the order they joined (people who joined together by name, then id). */
export const memberOrder = keyset('asc', [
  { by: toMs(memberships.createdAt), kind: 'instant' },
  { by: users.name, kind: 'string' },
  { by: memberships.userId, kind: 'number' },
]);

export function membersRepo(db: Executor) {
  return {
    roleOf(userId: number, restorationId: number): Promise<Role | undefined> {
      return membershipRole(db, userId, restorationId);
    },
    /** The restoration's members, all of them or one page (`window`). */
    async list(restorationId: number, window?: PageWindow) {
      const query = db
        .select({
          userId: users.id,
          name: users.name,
          email: users.email,
          role: memberships.role,
          since: memberships.createdAt,
        })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.restorationId, restorationId), memberOrder.after(window?.cursor)))
        .orderBy(...memberOrder.orderBy);
      return window ? query.limit(window.limit) : query;
    },
    /** Every membership of the restoration, locked FOR UPDATE until the calling transaction ends. */
    lockAll(restorationId: number) {
      return db
        .select({ userId: memberships.userId, role: memberships.role })
        .from(memberships)
        .where(eq(memberships.restorationId, restorationId))
        .for('update');
    },
    async add(restorationId: number, userId: number, role: Role) {
      await db.insert(memberships).values({ restorationId, userId, role }).onConflictDoNothing();
    },
    async setRole(restorationId: number, userId: number, role: Role) {
      const rows = await db
        .update(memberships)
        .set({ role })
        .where(and(eq(memberships.restorationId, restorationId), eq(memberships.userId, userId)))
        .returning({ userId: memberships.userId });
      return rows.length > 0;
    },
    async remove(restorationId: number, userId: number) {
      const rows = await db
        .delete(memberships)
        .where(and(eq(memberships.restorationId, restorationId), eq(memberships.userId, userId)))
        .returning({ userId: memberships.userId });
      return rows.length > 0;
    },
  };
}
