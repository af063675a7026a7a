import { and, desc, eq } from 'drizzle-orm';
import type { Stage } from '../../../shared/schemas/restorations';
import type { Executor } from '../../db/client';
import { estimates } from '../../db/schema';
import { ConflictError } from '../../http/errors';
import { readWorkshopSettings } from '../workshop/workshop-settings';

const pastAssessment: readonly Stage[] = ['repair', 'testing', 'returned'];

/**
 * When the workshop requires it, a set moves past Assessment only once its owner has approved the latest
 * estimate sent to them (a revised estimate needs its own approval).
 */
export async function assertEstimateApproved(
  db: Executor,
  restorationId: number,
  from: Stage,
  to: Stage,
): Promise<void> {
  if (!pastAssessment.includes(to) || pastAssessment.includes(from)) return;
  if (!(await readWorkshopSettings(db)).estimateApprovalRequired) return;
  const [latest] = await db
    .select({ version: estimates.version, decision: estimates.decision })
    .from(estimates)
    .where(and(eq(estimates.restorationId, restorationId), eq(estimates.sent, true)))
    .orderBy(desc(estimates.version))
    .limit(1);
  if (latest?.decision === 'approved') return;
  const state = !latest
    ? 'No estimate has been sent to the owner yet'
    : latest.decision === 'declined'
      ? `The owner declined version ${latest.version} of the estimate`
      : `The owner has not yet answered version ${latest.version} of the estimate`;
  throw new ConflictError(
    `${state}. This workshop needs the owner's approval before work goes past Assessment: send an estimate from the Money tab and wait for the owner to approve it.`,
    { gate: 'estimate-approval' },
  );
}
