import { z } from 'zod';
import { bodyIdSchema } from './ids';
import { isKnownTimeZone } from '../format/dates';
import { isCurrencyCode } from '../money/currency';

export const partActions = ['replaced', 'restuffed', 'kept-original', 'removed'] as const;
export const partStates = ['planned', 'ordered', 'fitted'] as const;
export const mainsPositions = ['none', 'across-line', 'line-to-chassis'] as const;
export const partActionLabels: Record<(typeof partActions)[number], string> = {
  replaced: 'Replaced',
  restuffed: 'Restuffed into the original case',
  'kept-original': 'Kept original',
  removed: 'Removed',
};
export const partStateLabels: Record<(typeof partStates)[number], string> = {
  planned: 'Planned',
  ordered: 'Ordered',
  fitted: 'Fitted',
};
export const mainsPositionLabels: Record<(typeof mainsPositions)[number], string> = {
  none: 'Not on the mains',
  'across-line': 'Across the mains (X)',
  'line-to-chassis': 'Mains to chassis (Y)',
};

const fields = {
  componentRef: z.string().trim().min(1, 'Give the reference as the schematic prints it, e.g. C27').max(20),
  findingId: bodyIdSchema.nullable(),
  originalPart: z.string().trim().max(200),
  originalRating: z.string().trim().max(100),
  replacementPart: z.string().trim().max(200),
  replacementRating: z.string().trim().max(100),
  action: z.enum(partActions),
  state: z.enum(partStates),
  mainsPosition: z.enum(mainsPositions),
  quantity: z.number().int().min(1).max(999),
  /** Cost of the line in minor units (pence, cents). */
  costMinor: z.number().int().min(0).max(100_000_000).nullable(),
  source: z.string().trim().max(200),
  testedAfter: z.string().trim().max(500),
  notes: z.string().trim().max(2000),
};

export const partInputSchema = z.object({
  ...fields,
  findingId: fields.findingId.optional(),
  originalPart: fields.originalPart.default(''),
  originalRating: fields.originalRating.default(''),
  replacementPart: fields.replacementPart.default(''),
  replacementRating: fields.replacementRating.default(''),
  action: fields.action.default('replaced'),
  state: fields.state.default('planned'),
  mainsPosition: fields.mainsPosition.default('none'),
  quantity: fields.quantity.default(1),
  costMinor: fields.costMinor.optional(),
  source: fields.source.default(''),
  testedAfter: fields.testedAfter.default(''),
  notes: fields.notes.default(''),
});
export type PartInput = z.input<typeof partInputSchema>;
export const partPatchSchema = z.object(fields).partial();

export const partSchema = z.object({
  id: z.number().int(),
  restorationId: z.number().int(),
  findingId: z.number().int().nullable(),
  componentRef: z.string(),
  originalPart: z.string(),
  originalRating: z.string(),
  replacementPart: z.string(),
  replacementRating: z.string(),
  action: z.enum(partActions),
  state: z.enum(partStates),
  mainsPosition: z.enum(mainsPositions),
  quantity: z.number().int(),
  /** Withheld from owners, with source and notes. */
  costMinor: z.number().int().nullable(),
  source: z.string(),
  testedAfter: z.string(),
  notes: z.string(),
  fittedAt: z.string().nullable(),
  warnings: z.array(z.object({ level: z.enum(['danger', 'caution']), message: z.string() })),
});
export type Part = z.infer<typeof partSchema>;

/**
 * `GET /api/restorations/:id/parts.csv?currency=GBP&timeZone=Europe/London`: the workshop's currency for the cost
 * column (ISO 4217) and the reader's time zone for the dates (IANA). Without them, costs have two decimals and
 * dates are UTC.
 */
export const partsCsvQuerySchema = z.object({
  currency: z
    .string()
    .regex(/^[A-Z]{3}$/)
    .refine(isCurrencyCode, 'Not a known currency')
    .optional(),
  timeZone: z.string().max(64).refine(isKnownTimeZone, 'Not a known time zone').optional(),
});
export type PartsCsvQuery = z.infer<typeof partsCsvQuerySchema>;
