import { z } from 'zod';
import { symptomIds } from '../bench/symptoms';
import { bodyIdSchema, idSchema } from './ids';
import { measurementInputSchema, verdicts } from './measurements';

export const causeResults = ['ruled-out', 'confirmed', 'inconclusive'] as const;
export type CauseResult = (typeof causeResults)[number];
export const causeResultLabels: Record<CauseResult, string> = {
  'ruled-out': 'Ruled out',
  confirmed: 'Confirmed',
  inconclusive: 'Not settled',
};

export const symptomCheckParamsSchema = z.object({
  id: idSchema,
  symptomId: z.enum(symptomIds as [string, ...string[]]),
  causeId: z.string().min(1).max(60),
});

/**
 * Ticks one cause off with its result. `reading` files the test's reading (judged like any other) on the
 * restoration and links it; `finding` (with a confirmed result) opens a confirmed finding pinned on that photo.
 */
export const symptomCheckInputSchema = z.object({
  result: z.enum(causeResults),
  note: z.string().trim().max(2000).default(''),
  reading: measurementInputSchema.optional(),
  finding: z.object({ photoId: bodyIdSchema }).optional(),
});
export type SymptomCheckInput = z.input<typeof symptomCheckInputSchema>;

export const symptomCheckReadingSchema = z.object({
  id: z.number(),
  location: z.string(),
  reading: z.string(),
  expected: z.string(),
  verdict: z.enum(verdicts),
  verdictReason: z.string(),
});
export type SymptomCheckReading = z.infer<typeof symptomCheckReadingSchema>;

export const symptomCheckSchema = z.object({
  symptomId: z.string(),
  causeId: z.string(),
  result: z.enum(causeResults),
  /** Empty on a help link: notes stay in the workshop. */
  note: z.string(),
  /** Null when there is none, or the reader may not see it. */
  reading: symptomCheckReadingSchema.nullable(),
  finding: z.object({ id: z.number(), photoId: z.number(), number: z.number() }).nullable(),
  checkedBy: z.string().nullable(),
  updatedAt: z.string(),
});
export type SymptomCheck = z.infer<typeof symptomCheckSchema>;
