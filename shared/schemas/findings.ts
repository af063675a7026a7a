import { z } from 'zod';

export const shapes = ['pin', 'circle', 'rect', 'arrow', 'freehand'] as const;
export const kinds = [
  'overheated',
  'cracked',
  'leaking',
  'corroded',
  'dry-joint',
  'missing',
  'modified',
  'noisy-control',
  'hazard',
  'test-point',
  'note',
] as const;
export const severities = ['hazard', 'fault', 'wear', 'cosmetic', 'info'] as const;
export const statuses = ['observed', 'suspected', 'confirmed', 'repaired', 'verified', 'dismissed'] as const;
export type Shape = (typeof shapes)[number];
export type Kind = (typeof kinds)[number];
export type Severity = (typeof severities)[number];
export type Status = (typeof statuses)[number];

export const kindLabels: Record<Kind, string> = {
  overheated: 'Overheated',
  cracked: 'Cracked or broken',
  leaking: 'Leaking or bulging',
  corroded: 'Corroded',
  'dry-joint': 'Dry joint',
  missing: 'Missing',
  modified: 'Modified',
  'noisy-control': 'Noisy control',
  hazard: 'Safety hazard',
  'test-point': 'Test point',
  note: 'Note',
};
export const severityLabels: Record<Severity, string> = {
  hazard: 'Hazard',
  fault: 'Fault',
  wear: 'Wear',
  cosmetic: 'Cosmetic',
  info: 'Info',
};
export const statusLabels: Record<Status, string> = {
  observed: 'Observed',
  suspected: 'Suspected',
  confirmed: 'Confirmed',
  repaired: 'Repaired',
  verified: 'Verified',
  dismissed: 'Dismissed',
};

/** A point in normalised image coordinates: 0..1 of the upright image's width and height. */
export const pointSchema = z.object({ x: z.number().min(0).max(1), y: z.number().min(0).max(1) });
export type NormalisedPoint = z.infer<typeof pointSchema>;

/** How many points each shape takes: pin 1; circle centre + a point on the rim; rect and arrow 2; freehand 2..2000. */
const pointCounts: Record<Shape, [number, number]> = {
  pin: [1, 1],
  circle: [2, 2],
  rect: [2, 2],
  arrow: [2, 2],
  freehand: [2, 2000],
};

export const geometrySchema = z
  .object({ shape: z.enum(shapes), points: z.array(pointSchema).min(1) })
  .superRefine((g, ctx) => {
    const [min, max] = pointCounts[g.shape];
    if (g.points.length < min || g.points.length > max)
      ctx.addIssue({
        code: 'custom',
        path: ['points'],
        message: `a ${g.shape} takes ${min === max ? min : `${min} to ${max}`} points, not ${g.points.length}`,
      });
  });

/** Component reference as the schematic prints it: C27, R20, V5, T1, VR2, S1a… */
export const componentRefSchema = z
  .string()
  .trim()
  .max(20)
  .regex(/^$|^[A-Za-z]{1,4}\d{1,5}[a-z]?$/, 'Write the reference as the schematic prints it, e.g. C27, R20 or V5');

export const findingInputSchema = z
  .object({
    title: z.string().trim().min(1, 'Give the finding a short title').max(140),
    componentRef: componentRefSchema.default(''),
    kind: z.enum(kinds).default('note'),
    severity: z.enum(severities).default('info'),
    ownerVisible: z.boolean().default(false),
  })
  .and(geometrySchema);
export type FindingInput = z.input<typeof findingInputSchema>;

export const findingPatchSchema = z.object({
  title: z.string().trim().min(1).max(140).optional(),
  componentRef: componentRefSchema.optional(),
  kind: z.enum(kinds).optional(),
  severity: z.enum(severities).optional(),
  ownerVisible: z.boolean().optional(),
  status: z.enum(statuses).optional(),
  /** Required when the status becomes dismissed. */
  dismissReason: z.string().trim().max(500).optional(),
  shape: z.enum(shapes).optional(),
  points: z.array(pointSchema).min(1).max(2000).optional(),
  /** A technician opens a question for the mentors; a technician or mentor resolves it. */
  questionOpen: z.boolean().optional(),
});
export type FindingPatch = z.input<typeof findingPatchSchema>;

export const findingSchema = z.object({
  id: z.number().int(),
  photoId: z.number().int(),
  restorationId: z.number().int(),
  /** Per-restoration number shown on the pin. */
  number: z.number().int(),
  shape: z.enum(shapes),
  points: z.array(pointSchema),
  title: z.string(),
  componentRef: z.string(),
  kind: z.enum(kinds),
  severity: z.enum(severities),
  status: z.enum(statuses),
  dismissReason: z.string().nullable(),
  ownerVisible: z.boolean(),
  authorId: z.number().int().nullable(),
  authorName: z.string().nullable(),
  /** An open question for the mentors on this finding's thread. */
  questionOpen: z.boolean(),
  commentCount: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Finding = z.infer<typeof findingSchema>;

export const findingChangeSchema = z.object({
  id: z.number().int(),
  actorName: z.string().nullable(),
  changes: z.record(z.string(), z.tuple([z.unknown(), z.unknown()])),
  createdAt: z.string(),
});
export type FindingChange = z.infer<typeof findingChangeSchema>;

export const openQuestionSchema = z.object({
  findingId: z.number().int(),
  photoId: z.number().int(),
  restorationId: z.number().int(),
  set: z.string(),
  number: z.number().int(),
  title: z.string(),
  componentRef: z.string(),
  askedAt: z.string(),
});
export type OpenQuestion = z.infer<typeof openQuestionSchema>;

/** The link that opens a finding on its photo, zoomed onto it. */
export const findingPath = (f: { restorationId: number; photoId: number; id: number }) =>
  `/restorations/${f.restorationId}/photos/${f.photoId}/findings/${f.id}`;
