import type { Executor } from '../../db/client';
import { ConflictError } from '../../http/errors';
import { returnedAllowed } from './safety-tests.service';
import { safetyRepo } from './safety.repo';

/**
 * The Returned gate: a set goes back to its owner only after its final safety test passes, or after a
 * technician records an override with a reason. Called by the restorations service on a stage change.
 */
export async function assertReturnedGate(db: Executor, restorationId: number): Promise<void> {
  const { latest, override } = await safetyRepo(db).gate(restorationId);
  if (returnedAllowed(latest, override)) return;
  const message = latest
    ? 'The latest final safety test failed, so the set cannot be marked Returned. Put right what failed and record a passing test on the Safety tab, or record an override with the reason there.'
    : 'No final safety test is recorded, so the set cannot be marked Returned. Record the safety test on the Safety tab (earth continuity, insulation at 500 V DC, fuse), or record an override with the reason there.';
  throw new ConflictError(message, { gate: 'returned', latestVerdict: latest?.verdict ?? null });
}
