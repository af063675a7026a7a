import { and, asc, count, eq } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Database } from '../../db/client';
import { memberships, users } from '../../db/schema';

export function membersRepo(db: Database) {
  return {
    async roleOf(userId: number, restorationId: number): Promise<Role | undefined> {
      const [row] = await db
        .select({ role: memberships.role })
        .from(memberships)
        .where(and(eq(memberships.userId, userId), eq(memberships.restorationId, restorationId)));
      return row?.role;
    },
    list(restorationId: number) {
      return db
        .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role, since: memberships.createdAt })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(eq(memberships.restorationId, restorationId))
        .orderBy(asc(memberships.createdAt), asc(users.name));
    },
    async technicianCount(restorationId: number): Promise<number> {
      const [row] = await db
        .select({ n: count() })
        .from(memberships)
        .where(and(eq(memberships.restorationId, restorationId), eq(memberships.role, 'technician')));
      return row?.n ?? 0;
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
