import type { Database } from '../../db/client';
import { events } from '../../db/schema';

export type NewEvent = typeof events.$inferInsert;

/** Adds a line to a restoration's history. History must never block the work it records, so failures are logged only. */
export async function recordEvent(db: Database, event: NewEvent): Promise<void> {
  try {
    await db.insert(events).values(event);
  } catch (err) {
    console.error(`event not recorded: ${(err as Error).message}`);
  }
}
