import type { Stage } from '../../../shared/schemas/restorations';
import { assertPrePowerSignedOff, type Db } from '../bringup/power-gate';
import { assertReturnedGate } from '../safety/returned-gate';
import { assertEstimateApproved } from '../estimates/estimate-gate';

/**
 * What must be true before a restoration enters a stage. Each gate throws a ConflictError (409) that says
 * what to do; the stage change is refused as a whole.
 */
export async function stageGates(db: Db, restorationId: number, from: Stage, to: Stage): Promise<void> {
  if (from === to) return;
  // Testing means a powered set: the first-power gate.
  if (to === 'testing') await assertPrePowerSignedOff(db, restorationId, 'moving the set to Testing');
  // Returned means back with its owner: the final safety test passed, or a technician's override.
  if (to === 'returned') await assertReturnedGate(db, restorationId);
  // Past Assessment, when the workshop requires it: the owner approved the latest estimate.
  await assertEstimateApproved(db, restorationId, from, to);
}
