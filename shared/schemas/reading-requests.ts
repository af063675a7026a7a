import { z } from 'zod';
import { bodyIdSchema, idSchema } from './ids';
import { measurementInputSchema } from './measurements';
import type { SymptomCheckReading } from './symptom-checks';

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

export interface ReadingRequest {
  id: number;
  restorationId: number;
  helpRequestId: number | null;
  kind: ReadingRequestKind;
  body: string;
  askedBy: string | null;
  createdAt: string;
  answeredAt: string | null;
  answeredBy: string | null;
  answerNote: string;
  reading: SymptomCheckReading | null;
  photo: { id: number; caption: string; thumbUrl: string } | null;
}
/** On a bench: the request with the set it is about. */
export interface BenchReadingRequest extends ReadingRequest {
  set: string;
  mine: boolean;
}
