import type { Executor } from '../../db/client';
import { events } from '../../db/schema';

export type NewEvent = typeof events.$inferInsert;

/**
 * Adds a line to a restoration's history, on the transaction of the change it records: a change and its
 * history line are saved together or not at all (a failure here undoes the change).
 */
export async function recordEvent(db: Executor, event: NewEvent): Promise<void> {
  await db.insert(events).values(event);
}
