import { eq } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Executor } from '../../db/client';
import { memberships } from '../../db/schema';

/** The roles a person holds on any restoration, from which their workshop role is judged. */
export async function rolesHeld(db: Executor, userId: number): Promise<Role[]> {
  const held = await db
    .selectDistinct({ role: memberships.role })
    .from(memberships)
    .where(eq(memberships.userId, userId));
  return held.map((h) => h.role);
}
