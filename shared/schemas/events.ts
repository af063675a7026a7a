import { z } from 'zod';

/** The history of a restoration: kinds of event (also the `event_kind` database enum), the timeline and the bench's activity. */
export const timelineKinds = [
  'photo-added',
  'finding-opened',
  'finding-status',
  'question-asked',
  'question-resolved',
  'part-fitted',
  'stage-changed',
  'measurement-out',
  'safety-test',
  'safety-override',
  'soak-session',
  'report-sent',
  'intake-checked',
  'pre-power-set',
  'pre-power-signed',
  'pre-power-voided',
  'bringup-step',
  'help-requested',
  'help-link-made',
  'help-link-withdrawn',
  'cause-checked',
  'reading-requested',
  'reading-answered',
  'estimate-sent',
  'estimate-decided',
  'labour-logged',
  'invoice-issued',
  'invoice-voided',
  'payment-received',
  'payment-refunded',
  'sheet-added',
  'reference-marked',
  'mismatch-noted',
] as const;
export const timelineQuerySchema = z.object({ kind: z.enum(timelineKinds).optional() });

export const timelineEventSchema = z.object({
  id: z.number().int(),
  kind: z.enum(timelineKinds),
  at: z.string(),
  actorName: z.string().nullable(),
  /** What happened, in words, written for the person reading it. */
  summary: z.string(),
  photoId: z.number().int().nullable(),
  findingId: z.number().int().nullable(),
  thumbUrl: z.string().nullable(),
  /** A safety departure (a waived pre-power item, a stop at power-up): shown in red. */
  caution: z.boolean(),
});
export type TimelineEvent = z.infer<typeof timelineEventSchema>;

/** A timeline line on the bench, with the set it belongs to. */
export const activityItemSchema = timelineEventSchema.extend({ restorationId: z.number().int(), set: z.string() });
export type ActivityItem = z.infer<typeof activityItemSchema>;
