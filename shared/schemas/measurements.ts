import { z } from 'zod';
import { measuredQuantities } from '../bench/reading-kinds';
import { idSchema, bodyIdSchema } from './ids';

const text = (max: number) => z.string().trim().max(max);

const fields = {
  location: z.string().trim().min(1, 'Say where: a component reference or test point, e.g. C27 or V5 pin 3').max(60),
  quantity: z.enum(measuredQuantities),
  expected: text(40),
  tolerance: text(20),
  rating: text(40),
  reading: z.string().trim().min(1, 'Enter the reading as the meter showed it').max(40),
  conditions: text(300),
  method: text(300),
  /** Voltages: the meter the service chart was taken with ("1k/V 250 V"), yours ("10 MΩ"), and the point's source resistance ("100k"). */
  chartMeter: text(60),
  meter: text(60),
  source: text(40),
  findingId: bodyIdSchema.nullable(),
  ownerVisible: z.boolean(),
  /** Taken with the set powered: refused until the pre-power checklist is signed off. */
  powerOn: z.boolean(),
};

/** How a reading was judged (also the `verdict` database enum). */
export const verdicts = ['within', 'marginal', 'out', 'unknown'] as const;

/** A reading as a person types it; the server computes the SI values and the verdict. */
export const measurementInputSchema = z.object({
  ...fields,
  expected: fields.expected.default(''),
  tolerance: fields.tolerance.default(''),
  rating: fields.rating.default(''),
  conditions: fields.conditions.default(''),
  method: fields.method.default(''),
  chartMeter: fields.chartMeter.default(''),
  meter: fields.meter.default(''),
  source: fields.source.default(''),
  findingId: fields.findingId.optional(),
  ownerVisible: fields.ownerVisible.default(false),
  powerOn: fields.powerOn.default(false),
});
export type MeasurementInput = z.input<typeof measurementInputSchema>;
/** Only what is sent changes (no defaults here, or a patch would blank the other fields). */
export const measurementPatchSchema = z.object(fields).partial();

export const measurementSchema = z.object({
  id: z.number().int(),
  restorationId: z.number().int(),
  findingId: z.number().int().nullable(),
  location: z.string(),
  quantity: z.enum(measuredQuantities),
  expectedText: z.string(),
  toleranceText: z.string(),
  ratingText: z.string(),
  readingText: z.string(),
  conditions: z.string(),
  method: z.string(),
  chartMeterText: z.string(),
  meterText: z.string(),
  sourceText: z.string(),
  expected: z.number().nullable(),
  reading: z.number(),
  rating: z.number().nullable(),
  reference: z.number().nullable(),
  deviation: z.number().nullable(),
  verdict: z.enum(verdicts),
  verdictReason: z.string(),
  ownerVisible: z.boolean(),
  powerOn: z.boolean(),
  measuredBy: z.string().nullable(),
  measuredAt: z.string(),
});
export type Measurement = z.infer<typeof measurementSchema>;

export const measurementListQuerySchema = z.object({ findingId: idSchema.optional() });

export const valveSchema = z.object({
  position: z
    .string()
    .trim()
    .regex(/^V\d{1,2}$/, 'Positions are V1, V2, …'),
  type: z.string().trim().min(1, 'Enter the type printed on the valve').max(20),
  notes: z.string().trim().max(200).default(''),
});
export const lineUpSchema = z.object({ valves: z.array(valveSchema).max(40) });
export type LineUpInput = z.input<typeof lineUpSchema>;
export type Valve = z.infer<typeof valveSchema>;
export const lineUpResultSchema = z.object({
  valves: z.array(valveSchema),
  liveChassis: z.object({ likely: z.boolean(), reasons: z.array(z.string()), unknown: z.array(z.string()).optional() }),
});
export type LineUp = z.infer<typeof lineUpResultSchema>;
