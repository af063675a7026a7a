import { z } from 'zod';
import { statuses } from './findings';
import { idSchema } from './ids';

export const views = ['top', 'underside', 'rear', 'front', 'detail', 'schematic', 'other'] as const;
export const phases = ['before', 'during', 'after'] as const;
export const viewSchema = z.enum(views);
export const phaseSchema = z.enum(phases);
export type View = z.infer<typeof viewSchema>;
export type Phase = z.infer<typeof phaseSchema>;

export const viewLabels: Record<View, string> = {
  top: 'Top',
  underside: 'Underside',
  rear: 'Rear',
  front: 'Front',
  detail: 'Detail',
  schematic: 'Schematic',
  other: 'Other',
};
export const phaseLabels: Record<Phase, string> = { before: 'Before', during: 'During', after: 'After' };

/** Multipart fields sent with the image (field `file`); form values arrive as strings. */
export const photoUploadFieldsSchema = z.object({
  view: viewSchema.default('other'),
  phase: phaseSchema.default('before'),
  caption: z.string().trim().max(500, 'Keep the caption under 500 characters').default(''),
  ownerVisible: z
    .union([z.boolean(), z.enum(['true', 'false', 'on', ''])])
    .transform((v) => v === true || v === 'true' || v === 'on')
    .default(false),
});
export type PhotoUploadFields = z.input<typeof photoUploadFieldsSchema>;

export const photoPatchSchema = z
  .object({
    view: viewSchema,
    phase: phaseSchema,
    caption: z.string().trim().max(500, 'Keep the caption under 500 characters'),
    ownerVisible: z.boolean(),
  })
  .partial();
export type PhotoPatch = z.infer<typeof photoPatchSchema>;

export const photoSchema = z.object({
  id: z.number().int(),
  restorationId: z.number().int(),
  view: viewSchema,
  phase: phaseSchema,
  caption: z.string(),
  ownerVisible: z.boolean(),
  /** Pixel size of the upright original. */
  width: z.number().int(),
  height: z.number().int(),
  /** When the camera says it was taken (EXIF), if it says. */
  takenAt: z.string().nullable(),
  uploadedAt: z.string(),
  uploadedBy: z.string().nullable(),
  contentType: z.string(),
  sizeBytes: z.number().int(),
  /** Short-lived presigned URLs; `original` only for those allowed to download it. */
  /** Variants: thumb (400 px), phone (1,280 px), display (2,560 px), each at most the original's size. */
  urls: z.object({ thumb: z.string(), phone: z.string(), display: z.string(), original: z.string().optional() }),
  /**
   * How many of the photo's findings the reader may see, by status (a status with none is left out). Sent with
   * the photos list (counted under the visibility rule in the same query); absent on single-photo answers.
   */
  findingCounts: z.partialRecord(z.enum(statuses), z.number().int().nonnegative()).optional(),
});
export type Photo = z.infer<typeof photoSchema>;

export const photoParamsSchema = z.object({ id: idSchema });
