import { and, asc, eq, sql } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Executor } from '../../db/client';
import { memberships, users } from '../../db/schema';

/** The roles a person holds on any restoration, from which their workshop role is judged. */
export async function rolesHeld(db: Executor, userId: number): Promise<Role[]> {
  const held = await db
    .selectDistinct({ role: memberships.role })
    .from(memberships)
    .where(eq(memberships.userId, userId));
  return held.map((h) => h.role);
}

/** The workshop's administrators (decision 46): who changes its settings and names the others. */
export function workshopAdminsRepo(db: Executor) {
  return {
    async isAdmin(userId: number): Promise<boolean> {
      const [row] = await db.select({ admin: users.workshopAdmin }).from(users).where(eq(users.id, userId));
      return row?.admin ?? false;
    },
    /** Names for everyone who may read the settings; addresses only for administrators (`withEmail`). */
    async list(withEmail: boolean) {
      return db
        .select({ id: users.id, name: users.name, email: withEmail ? users.email : sql<null>`null` })
        .from(users)
        .where(eq(users.workshopAdmin, true))
        .orderBy(asc(users.name), asc(users.id));
    },
    /** Makes the account an administrator; false when it was one already. */
    async grant(userId: number): Promise<boolean> {
      const rows = await db
        .update(users)
        .set({ workshopAdmin: true })
        .where(and(eq(users.id, userId), eq(users.workshopAdmin, false)))
        .returning({ id: users.id });
      return rows.length > 0;
    },
    /** Takes the role back unless it would leave the workshop with none; false when it did not. */
    async revoke(userId: number): Promise<boolean> {
      const rows = await db
        .update(users)
        .set({ workshopAdmin: false })
        .where(
          and(
            eq(users.id, userId),
            eq(users.workshopAdmin, true),
            sql`exists (select 1 from ${users} others where others.workshop_admin and others.id <> ${userId})`,
          ),
        )
        .returning({ id: users.id });
      return rows.length > 0;
    },
    /**
     * On a new workshop, the first account confirmed becomes its administrator. Serialised by an advisory lock, so
     * two first sign-ups at once still make one; does nothing once the workshop has one.
     */
    async claimIfNone(userId: number): Promise<void> {
      await db.execute(sql`select pg_advisory_xact_lock(hashtext('gridleak.workshop-admin'))`);
      await db
        .update(users)
        .set({ workshopAdmin: true })
        .where(
          and(
            eq(users.id, userId),
            sql`not exists (select 1 from ${users} others where others.workshop_admin and others.id <> ${userId})`,
          ),
        );
    },
  };
}
