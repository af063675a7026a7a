import { and, eq, isNull, sql } from 'drizzle-orm';
import { hashPassword } from '../../features/auth/password';
import { restorationInputSchema } from '../../../shared/schemas/restorations';
import type { Database } from '../client';
import { memberships, restorations, users } from '../schema';
import { DEMO_PASSWORD, demoPeople, demoRestorations } from './demo-scenario';

/** Seeds the demo accounts and restorations; running it again changes nothing. */
export async function seedDemo(db: Database): Promise<void> {
  const ids: Partial<Record<keyof typeof demoPeople, number>> = {};
  for (const [key, person] of Object.entries(demoPeople) as [
    keyof typeof demoPeople,
    { name: string; email: string },
  ][]) {
    const [existing] = await db
      .select({ id: users.id })
      .from(users)
      .where(sql`lower(${users.email}) = ${person.email}`);
    ids[key] = existing?.id ?? (await insertUser(db, person));
  }
  // Demo addresses are invented, so no confirmation link could ever reach them.
  await db
    .update(users)
    .set({ emailConfirmedAt: new Date() })
    .where(
      and(
        isNull(users.emailConfirmedAt),
        sql`lower(${users.email}) in (${sql.join(
          Object.values(demoPeople).map((p) => sql`${p.email}`),
          sql`, `,
        )})`,
      ),
    );
  // The demo's technician runs the workshop: she changes its settings and names who else may.
  await db.update(users).set({ workshopAdmin: true }).where(eq(users.id, ids.technician!));
  for (const demo of demoRestorations) {
    const { members, ...fields } = demo;
    const [found] = await db
      .select({ id: restorations.id })
      .from(restorations)
      .where(and(eq(restorations.make, demo.make), eq(restorations.serial, demo.serial)));
    const id =
      found?.id ?? (await db.insert(restorations).values(restorationInputSchema.parse(fields)).returning())[0]!.id;
    for (const [person, role] of Object.entries(members)) {
      await db
        .insert(memberships)
        .values({ restorationId: id, userId: ids[person as keyof typeof demoPeople]!, role: role! })
        .onConflictDoNothing();
    }
  }
}

async function insertUser(db: Database, person: { name: string; email: string }): Promise<number> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const [row] = await db
    .insert(users)
    .values({ ...person, passwordHash, emailConfirmedAt: new Date() })
    .returning({ id: users.id });
  return row!.id;
}
