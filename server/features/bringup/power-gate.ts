import { eq } from 'drizzle-orm';
import { prePowerMissing } from '../../../shared/schemas/bringup';
import type { Executor } from '../../db/client';
import { prePowerChecks, prePowerSignoffs } from '../../db/schema';
import { ConflictError } from '../../http/errors';

/** A database or an open transaction: the gate is read inside the write it protects. */
export type Db = Executor;

export async function prePowerSignedOff(db: Db, restorationId: number): Promise<boolean> {
  const [row] = await db
    .select({ id: prePowerSignoffs.id })
    .from(prePowerSignoffs)
    .where(eq(prePowerSignoffs.restorationId, restorationId));
  return row !== undefined;
}

/**
 * The first-power gate: nothing that puts mains on the set is recorded until a technician has signed the
 * pre-power checklist off. `doing` finishes the sentence "Sign off the pre-power checklist before …".
 */
export async function assertPrePowerSignedOff(db: Db, restorationId: number, doing: string): Promise<void> {
  if (await prePowerSignedOff(db, restorationId)) return;
  const items = await db
    .select({ item: prePowerChecks.item, status: prePowerChecks.status, reason: prePowerChecks.reason })
    .from(prePowerChecks)
    .where(eq(prePowerChecks.restorationId, restorationId));
  const missing = prePowerMissing(items);
  throw new ConflictError(
    `Sign off the pre-power checklist before ${doing}. On the Bring-up tab, a technician marks each item done, not applicable or waived (with a reason), then signs the checklist off.`,
    { gate: 'pre-power', missing },
  );
}
