import { z } from 'zod';
import { bodyIdSchema, idSchema } from './ids';
import { componentRefSchema, pointSchema } from './findings';

/** What a service sheet page shows. */
export const sheetKinds = ['circuit-diagram', 'layout', 'alignment-table', 'voltage-chart', 'parts-list'] as const;
export type SheetKind = (typeof sheetKinds)[number];
export const sheetKindLabels: Record<SheetKind, string> = {
  'circuit-diagram': 'Circuit diagram', layout: 'Layout / component location', 'alignment-table': 'Alignment table',
  'voltage-chart': 'Voltage chart', 'parts-list': 'Parts list',
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
export type SheetUploadFields = z.input<typeof sheetUploadFieldsSchema>;

export const sheetPagePatchSchema = z
  .object({ kind: z.enum(sheetKinds), title: z.string().trim().max(200, 'Keep the title under 200 characters'), ownerVisible: z.boolean() })
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
export const sheetSchema = z.object({ id: z.number().int(), restorationId: z.number().int(), contentType: z.string(), pages: z.array(sheetPageSchema) });
export type Sheet = z.infer<typeof sheetSchema>;

/**
 * A reference as the diagram prints it (the findings' own rule: C27, R20, V5, T1, VR2, S1a), required here and
 * upper-cased, so references link whatever case they were typed in.
 */
export const markRefSchema = componentRefSchema.min(1, 'give the reference, e.g. R23').transform((ref) => ref.toUpperCase());

export const referenceShapes = ['pin', 'rect'] as const;
export type ReferenceShape = (typeof referenceShapes)[number];

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
      ctx.addIssue({ code: 'custom', path: ['points'], message: `a ${m.shape} takes ${m.shape === 'pin' ? 1 : 2} points` });
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
