import { and, eq } from 'drizzle-orm';
import type { Role } from '../../shared/permissions';
import type { Executor } from './client';
import { memberships } from './schema';

/**
 * A person's role on a restoration, or undefined when they are not a member. The one membership lookup: the route
 * guard (server/http, which imports no feature) and the members repository both ask it.
 */
export async function membershipRole(db: Executor, userId: number, restorationId: number): Promise<Role | undefined> {
  const [row] = await db
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.userId, userId), eq(memberships.restorationId, restorationId)));
  return row?.role;
}
