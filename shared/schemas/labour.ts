import { z } from 'zod';
import { bodyIdSchema } from './ids';
import { stages } from './restorations';

/** What a time entry is for: a finding on the set, or a stage of the work (exactly one). */
const target = {
  findingId: bodyIdSchema.nullable().default(null),
  stage: z.enum(stages).nullable().default(null),
  note: z.string().trim().max(500).default(''),
  billable: z.boolean().default(true),
};
const oneTarget = (v: { findingId: number | null; stage: string | null }) =>
  (v.findingId === null) !== (v.stage === null);
const oneTargetMessage = { message: 'tie the time to a finding or to a stage, not both', path: ['stage'] };

/** Body of POST /api/restorations/:id/labour: typed hours, as whole minutes, on a day. */
export const labourEntryInputSchema = z
  .object({
    ...target,
    minutes: z
      .number()
      .int('must be whole minutes')
      .min(1)
      .max(24 * 60),
    /** When the work was done (ISO instant); now when left out. */
    workedAt: z.iso.datetime().optional(),
  })
  .refine(oneTarget, oneTargetMessage);

/** Body of POST /api/restorations/:id/labour/timer. */
export const labourTimerInputSchema = z.object(target).refine(oneTarget, oneTargetMessage);

export const labourEntrySchema = z.object({
  id: z.number(),
  technician: z.string().nullable(),
  findingId: z.number().nullable(),
  stage: z.enum(stages).nullable(),
  note: z.string(),
  billable: z.boolean(),
  startedAt: z.string(),
  /** Null while the timer runs. */
  stoppedAt: z.string().nullable(),
  minutes: z.number().nullable(),
});
export const labourLogSchema = z.object({
  entries: z.array(labourEntrySchema),
  /** The reader's own running timer, on any restoration. */
  running: labourEntrySchema.extend({ restorationId: z.number() }).nullable(),
  /** Minutes per technician this week (Monday 00:00 UTC onwards), on this restoration. */
  week: z.array(z.object({ technician: z.string().nullable(), minutes: z.number(), billableMinutes: z.number() })),
});
export type LabourLog = z.infer<typeof labourLogSchema>;
