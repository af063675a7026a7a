import type { Database } from '../../db/client';
import { safetyTestsService } from './safety-tests.service';
import { soakService } from './soak.service';

/**
 * What the hand-back report says about the final safety test and the soak: the latest test exactly as judged
 * (a fail stays a fail), the override when the set went back on one, and the soak hours.
 */
export async function safetyReportData(db: Database, restorationId: number) {
  const status = await safetyTestsService(db).status(restorationId);
  const soak = await soakService(db).log(restorationId);
  const passed = status.latest?.verdict === 'pass';
  return {
    latest: status.latest,
    /** Shown only when the latest test did not pass: the owner must see that no pass happened. */
    override: passed ? null : status.override,
    soakHours: soak.totalHours,
    soakSessions: soak.sessions.filter((s) => s.endedAt !== null),
  };
}
