import { z } from 'zod';
import { bodyIdSchema, idSchema } from './ids';
import { measurementInputSchema } from './measurements';
import { symptomCheckReadingSchema } from './symptom-checks';

export const readingRequestKinds = ['reading', 'photo', 'note'] as const;
export type ReadingRequestKind = (typeof readingRequestKinds)[number];
export const readingRequestKindLabels: Record<ReadingRequestKind, string> = {
  reading: 'A reading',
  photo: 'A photo',
  note: 'A note',
};

/** A mentor asks for something specific; it waits on the technician's bench until answered. */
export const readingRequestInputSchema = z.object({
  kind: z.enum(readingRequestKinds),
  body: z.string().trim().min(1, 'say what to measure or photograph, and where').max(1000),
  helpRequestId: bodyIdSchema.optional(),
});
export type ReadingRequestInput = z.infer<typeof readingRequestInputSchema>;

/** The answer: a new reading (judged as usual), a photo already on the restoration, or a note; at least one. */
export const readingAnswerInputSchema = z
  .object({
    reading: measurementInputSchema.optional(),
    photoId: bodyIdSchema.optional(),
    note: z.string().trim().max(2000).default(''),
  })
  .refine((a) => a.reading || a.photoId || a.note, {
    message: 'answer with a reading, a photo or a note',
    path: ['note'],
  });
export type ReadingAnswerInput = z.input<typeof readingAnswerInputSchema>;

export const readingRequestParamsSchema = z.object({ readingRequestId: idSchema });

export const readingRequestSchema = z.object({
  id: z.number(),
  restorationId: z.number(),
  helpRequestId: z.number().nullable(),
  kind: z.enum(readingRequestKinds),
  body: z.string(),
  askedBy: z.string().nullable(),
  createdAt: z.string(),
  answeredAt: z.string().nullable(),
  answeredBy: z.string().nullable(),
  answerNote: z.string(),
  reading: symptomCheckReadingSchema.nullable(),
  photo: z.object({ id: z.number(), caption: z.string(), thumbUrl: z.string() }).nullable(),
});
export type ReadingRequest = z.infer<typeof readingRequestSchema>;

/** On a bench: the request with the set it is about. */
export const benchReadingRequestSchema = readingRequestSchema.extend({ set: z.string(), mine: z.boolean() });
export type BenchReadingRequest = z.infer<typeof benchReadingRequestSchema>;
