import { eq } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { memberships, restorations } from '../../db/schema';

/** The queries the history needs beyond the timeline builder: which sets a person is on, and what they are called. */
export function eventsRepo(db: Executor) {
  return {
    /** A subquery of the restorations the person is a member of, for `inArray(events.restorationId, …)`. */
    restorationIdsOf(userId: number) {
      return db.select({ id: memberships.restorationId }).from(memberships).where(eq(memberships.userId, userId));
    },
    /** The person's sets with their make, model and the person's role on each. */
    setsOf(userId: number) {
      return db
        .select({ id: restorations.id, make: restorations.make, model: restorations.model, role: memberships.role })
        .from(memberships)
        .innerJoin(restorations, eq(restorations.id, memberships.restorationId))
        .where(eq(memberships.userId, userId));
    },
  };
}
