import { z } from 'zod';
import { isKnownTimeZone } from '../format/dates';
import { isCurrencyCode } from '../money/currency';
import { taxRoundings } from '../money/tax';
import { bodyIdSchema, idSchema } from './ids';

/** An amount in minor units with its ISO 4217 currency: the shape of every amount the API returns. */
export const moneySchema = z.object({ amount: z.number().int(), currency: z.string().length(3) });

/** Whether the runtime's Intl knows the name as an IANA time zone. */
export const isTimeZone = (name: string): boolean => name.length > 0 && isKnownTimeZone(name);

const minor = z.number().int('must be whole minor units (pence, cents)').min(0).max(100_000_000);
const minutes = z
  .number()
  .int('must be whole minutes')
  .min(0)
  .max(100 * 60 * 10);

export const workshopSettingsSchema = z.object({
  currency: z
    .string()
    .trim()
    .toUpperCase()
    .refine(isCurrencyCode, 'must be an ISO 4217 currency code such as GBP or EUR'),
  labourRate: minor,
  partsMarkupBasisPoints: z.number().int().min(0).max(100_000),
  taxName: z.string().trim().min(1).max(40),
  /** Null: the workshop charges no tax. 20% = 2000. */
  taxRateBasisPoints: z.number().int().min(0).max(10_000).nullable(),
  taxRounding: z.enum(taxRoundings),
  estimateApprovalRequired: z.boolean(),
  /** Printed before every invoice number, e.g. "CL-" for CL-42; letters, digits, "-", "/" and "." only. */
  invoicePrefix: z
    .string()
    .trim()
    .max(12)
    .regex(/^[A-Za-z0-9./-]*$/, 'use letters, digits, "-", "/" or "." only'),
  /** IANA time zone for dates on documents the workshop e-mails. */
  timeZone: z.string().trim().max(64).refine(isTimeZone, 'must be an IANA time zone such as Europe/London'),
});
export type WorkshopSettings = z.infer<typeof workshopSettingsSchema>;

export const estimateLineKinds = ['labour', 'part', 'extra'] as const;
/** Extras a workshop flags on an estimate (TRADE.md: sets without a schematic, earlier botched work, cabinets). */
export const estimateExtras = ['no-schematic', 'earlier-work', 'cabinet', 'other'] as const;
export const estimateExtraLabels: Record<(typeof estimateExtras)[number], string> = {
  'no-schematic': 'No schematic available',
  'earlier-work': 'Undoing earlier work',
  cabinet: 'Cabinet work',
  other: 'Other extra',
};
export const estimateDecisions = ['approved', 'declined'] as const;

const description = z.string().trim().min(1, 'say what the line is for').max(200);
const ordered = <T extends { low: number; high: number }>(v: T) => v.low <= v.high;
const orderedMessage = { message: 'the low bound must not exceed the high bound', path: ['high'] };

export const estimateLineInputSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('labour'), description, low: minutes, high: minutes }).refine(ordered, orderedMessage),
  z.object({ kind: z.literal('part'), description, low: minor, high: minor }).refine(ordered, orderedMessage),
  z
    .object({ kind: z.literal('extra'), description, extra: z.enum(estimateExtras), low: minor, high: minor })
    .refine(ordered, orderedMessage),
]);
export type EstimateLineInput = z.infer<typeof estimateLineInputSchema>;

/** Body of POST /api/restorations/:id/estimates: a new version (labour in minutes, amounts in minor units). */
export const estimateInputSchema = z.object({
  note: z.string().trim().max(2000).default(''),
  lines: z.array(estimateLineInputSchema).min(1, 'an estimate needs at least one line').max(100),
  /** Send it to the owner now (shown on their page and e-mailed), or keep it as a draft. */
  send: z.boolean().default(true),
});
export type EstimateInput = z.infer<typeof estimateInputSchema>;

/** Body of POST /api/estimates/:estimateId/decision: the owner's answer to the version they read. */
export const estimateDecisionInputSchema = z.object({
  decision: z.enum(estimateDecisions),
  name: z.string().trim().min(1, 'type your name').max(120),
  version: bodyIdSchema,
});

export const estimateParamsSchema = z.object({ estimateId: idSchema });

export const estimateSchema = z.object({
  id: z.number(),
  version: z.number(),
  note: z.string(),
  sent: z.boolean(),
  sentAt: z.string().nullable(),
  createdBy: z.string().nullable(),
  low: moneySchema,
  high: moneySchema,
  labourRate: moneySchema,
  partsMarkupBasisPoints: z.number(),
  tax: z.object({ name: z.string(), rateBasisPoints: z.number(), rounding: z.enum(taxRoundings) }).nullable(),
  decision: z.enum(estimateDecisions).nullable(),
  decidedByName: z.string().nullable(),
  decidedAt: z.string().nullable(),
  lines: z.array(
    z.object({
      id: z.number(),
      kind: z.enum(estimateLineKinds),
      description: z.string(),
      extra: z.enum(estimateExtras).nullable(),
      minutesLow: z.number().nullable(),
      minutesHigh: z.number().nullable(),
      low: moneySchema,
      high: moneySchema,
    }),
  ),
});
export type Estimate = z.infer<typeof estimateSchema>;
