import { and, eq } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { restorations, users } from '../../db/schema';
import { demoPeople } from '../../db/seed/demo-scenario';

/** The demo sets the seeds add to, named as the scenario names them (make and serial). */
export const MERIDIAN_54 = { make: 'Ostrander & Vale', serial: 'OV-54-20417' } as const;
export const WREN_AC_DC = { make: 'Kestrel Wireless Co.', serial: 'KW-3381' } as const;

/** A demo set's row, or undefined before the scenario has been seeded. */
export async function demoSet(db: Executor, set: { make: string; serial: string }) {
  const [row] = await db
    .select()
    .from(restorations)
    .where(and(eq(restorations.make, set.make), eq(restorations.serial, set.serial)));
  return row;
}

/** A demo person's user id by their part in the scenario, or undefined before the people are seeded. */
export async function demoUserId(db: Executor, part: keyof typeof demoPeople): Promise<number | undefined> {
  const [row] = await db.select({ id: users.id }).from(users).where(eq(users.email, demoPeople[part].email));
  return row?.id;
}
