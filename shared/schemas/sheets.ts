import { z } from 'zod';
import { bodyIdSchema, idSchema } from './ids';
import { componentRefSchema, pointSchema } from './findings';

/** What a service sheet page shows. */
export const sheetKinds = ['circuit-diagram', 'layout', 'alignment-table', 'voltage-chart', 'parts-list'] as const;
export type SheetKind = (typeof sheetKinds)[number];
export const sheetKindLabels: Record<SheetKind, string> = {
  'circuit-diagram': 'Circuit diagram',
  layout: 'Layout / component location',
  'alignment-table': 'Alignment table',
  'voltage-chart': 'Voltage chart',
  'parts-list': 'Parts list',
};

const formFlag = z
  .union([z.boolean(), z.enum(['true', 'false', 'on', ''])])
  .transform((v) => v === true || v === 'true' || v === 'on')
  .default(false);

/** Multipart fields sent with the sheet (field `file`); form values arrive as strings. */
export const sheetUploadFieldsSchema = z.object({
  kind: z.enum(sheetKinds).default('circuit-diagram'),
  title: z.string().trim().max(200, 'Keep the title under 200 characters').default(''),
  ownerVisible: formFlag,
});

export const sheetPagePatchSchema = z
  .object({
    kind: z.enum(sheetKinds),
    title: z.string().trim().max(200, 'Keep the title under 200 characters'),
    ownerVisible: z.boolean(),
  })
  .partial();
export type SheetPagePatch = z.infer<typeof sheetPagePatchSchema>;

export const sheetPageSchema = z.object({
  id: z.number().int(),
  restorationId: z.number().int(),
  sheetId: z.number().int(),
  /** 1-based page number within the uploaded file. */
  pageNumber: z.number().int(),
  kind: z.enum(sheetKinds),
  title: z.string(),
  ownerVisible: z.boolean(),
  width: z.number().int(),
  height: z.number().int(),
  uploadedAt: z.string(),
  /** Short-lived presigned URLs; `large` keeps thin lines and 6-point print legible at 200 % zoom. */
  urls: z.object({ thumb: z.string(), display: z.string(), large: z.string(), original: z.string().optional() }),
});
export type SheetPage = z.infer<typeof sheetPageSchema>;

/** The answer to an upload: the sheet and its pages. */
export const sheetSchema = z.object({
  id: z.number().int(),
  restorationId: z.number().int(),
  contentType: z.string(),
  pages: z.array(sheetPageSchema),
});
export type Sheet = z.infer<typeof sheetSchema>;

/**
 * A reference as the diagram prints it (the findings' own rule: C27, R20, V5, T1, VR2, S1a), required here and
 * upper-cased, so references link whatever case they were typed in.
 */
export const markRefSchema = componentRefSchema
  .min(1, 'give the reference, e.g. R23')
  .transform((ref) => ref.toUpperCase());

export const referenceShapes = ['pin', 'rect'] as const;

/** A reference mark: on a sheet page (a diagram mark) or on a chassis photo (a location mark), never both. */
export const referenceMarkInputSchema = z
  .object({
    sheetPageId: bodyIdSchema.optional(),
    photoId: bodyIdSchema.optional(),
    ref: markRefSchema,
    shape: z.enum(referenceShapes),
    points: z.array(pointSchema).min(1).max(2),
  })
  .superRefine((m, ctx) => {
    if ((m.sheetPageId === undefined) === (m.photoId === undefined))
      ctx.addIssue({ code: 'custom', path: ['sheetPageId'], message: 'mark either a sheet page or a photo' });
    if (m.points.length !== (m.shape === 'pin' ? 1 : 2))
      ctx.addIssue({
        code: 'custom',
        path: ['points'],
        message: `a ${m.shape} takes ${m.shape === 'pin' ? 1 : 2} points`,
      });
  });
export type ReferenceMarkInput = z.input<typeof referenceMarkInputSchema>;

export const referenceMarkSchema = z.object({
  id: z.number().int(),
  restorationId: z.number().int(),
  sheetPageId: z.number().int().nullable(),
  photoId: z.number().int().nullable(),
  ref: z.string(),
  shape: z.enum(referenceShapes),
  points: z.array(pointSchema),
  createdAt: z.string(),
});
export type ReferenceMark = z.infer<typeof referenceMarkSchema>;

export const referenceMarksQuerySchema = z.object({ ref: markRefSchema.optional() });

/** Everything known about one reference in a restoration, counted as the reader may see it. */
export const referenceSummarySchema = z.object({
  ref: z.string(),
  diagramMarks: z.number().int(),
  chassisMarks: z.number().int(),
  findings: z.number().int(),
  parts: z.number().int(),
  readings: z.number().int(),
});
export type ReferenceSummary = z.infer<typeof referenceSummarySchema>;

export const sheetPageParamsSchema = z.object({ pageId: idSchema });
export const referenceMarkParamsSchema = z.object({ markId: idSchema });

/** How a part on the chassis differs from the diagram. */
export const mismatchKinds = ['value-differs', 'unlisted-part', 'misprint', 'other'] as const;
export type MismatchKind = (typeof mismatchKinds)[number];
export const mismatchKindLabels: Record<MismatchKind, string> = {
  'value-differs': 'Different value fitted',
  'unlisted-part': 'Part not on the diagram',
  misprint: 'Misprint on the sheet',
  other: 'Other difference',
};

const shortText = (max: number) => z.string().trim().max(max, `Keep it under ${max} characters`);

export const mismatchNoteInputSchema = z
  .object({
    ref: markRefSchema,
    kind: z.enum(mismatchKinds),
    diagramSays: shortText(200).default(''),
    chassisHas: shortText(200).default(''),
    note: shortText(2000).default(''),
    ownerVisible: z.boolean().default(false),
  })
  .refine((m) => m.diagramSays || m.chassisHas || m.note, {
    path: ['note'],
    message: 'say what differs: what the diagram says, what is fitted, or a note',
  });
export type MismatchNoteInput = z.input<typeof mismatchNoteInputSchema>;
/** A patch has no defaults (decision 15). */
export const mismatchNotePatchSchema = z
  .object({
    kind: z.enum(mismatchKinds),
    diagramSays: shortText(200),
    chassisHas: shortText(200),
    note: shortText(2000),
    ownerVisible: z.boolean(),
  })
  .partial();
export type MismatchNotePatch = z.infer<typeof mismatchNotePatchSchema>;

export const mismatchNoteSchema = z.object({
  id: z.number().int(),
  restorationId: z.number().int(),
  ref: z.string(),
  kind: z.enum(mismatchKinds),
  diagramSays: z.string(),
  chassisHas: z.string(),
  note: z.string(),
  ownerVisible: z.boolean(),
  createdAt: z.string(),
});
export type MismatchNote = z.infer<typeof mismatchNoteSchema>;
export const mismatchNoteParamsSchema = z.object({ noteId: idSchema });

/** One line of a mismatch in words, for the report and a help request. */
export const mismatchLine = (m: Pick<MismatchNote, 'ref' | 'kind' | 'diagramSays' | 'chassisHas' | 'note'>) =>
  [
    `${m.ref}: ${mismatchKindLabels[m.kind].toLowerCase()}`,
    m.diagramSays && `the diagram says ${m.diagramSays}`,
    m.chassisHas && `the chassis has ${m.chassisHas}`,
    m.note,
  ]
    .filter(Boolean)
    .join('; ');
