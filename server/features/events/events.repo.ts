import { eq, inArray } from 'drizzle-orm';
import type { Executor } from '../../db/client';
import { events, memberships } from '../../db/schema';

/** What the history needs beyond the timeline builder: which sets' events a person's activity reads. */
export function eventsRepo(db: Executor) {
  return {
    /** Events on the restorations the person is a member of (a subquery of the same statement). */
    onSetsOf(userId: number) {
      return inArray(
        events.restorationId,
        db.select({ id: memberships.restorationId }).from(memberships).where(eq(memberships.userId, userId)),
      );
    },
  };
}
