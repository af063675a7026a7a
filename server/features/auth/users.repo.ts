import { eq, sql } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { users } from '../../db/schema';

export type UserRow = typeof users.$inferSelect;

/** Works on the database or inside a transaction. */
export function usersRepo(db: Executor) {
  return {
    async byEmail(email: string): Promise<UserRow | undefined> {
      const [row] = await db
        .select()
        .from(users)
        .where(sql`lower(${users.email}) = lower(${email})`);
      return row;
    },
    async byId(id: number): Promise<UserRow | undefined> {
      const [row] = await db.select().from(users).where(eq(users.id, id));
      return row;
    },
    async insert(values: {
      name: string;
      email: string;
      passwordHash: string;
      emailConfirmedAt?: Date | null;
    }): Promise<UserRow> {
      const [row] = await db.insert(users).values(values).returning();
      return row!;
    },
    async setPassword(id: number, passwordHash: string): Promise<void> {
      await db.update(users).set({ passwordHash }).where(eq(users.id, id));
    },
  };
}

/** What leaves the server about a person: never the hash. */
export const publicUser = (u: UserRow) => ({ id: u.id, name: u.name, email: u.email });
