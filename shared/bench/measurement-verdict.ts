import { BenchInputError } from './bench-input-error';
import { esrLimitDetail } from './esr-limit';
import { leakageLimitDetail } from './leakage-limit';
import { formatQuantity } from './quantity-format';
import { parseQuantity, type QuantityUnit } from './quantity-parse';
import { readingVerdict, type Tolerance } from './reading-verdict';
import { parseTolerance } from './tolerance-text';

export const measuredQuantities = ['esr', 'capacitance', 'leakage', 'resistance', 'dc-voltage', 'ac-voltage', 'current', 'insulation', 'frequency'] as const;
export type MeasuredQuantity = (typeof measuredQuantities)[number];

/** The SI unit each kind of reading is in. */
export const quantityUnits: Record<MeasuredQuantity, Exclude<QuantityUnit, ''>> = {
  esr: 'Ω', capacitance: 'F', leakage: 'A', resistance: 'Ω', 'dc-voltage': 'V', 'ac-voltage': 'V', current: 'A', insulation: 'Ω', frequency: 'Hz',
};

/** ±20 %: the usual allowance on voltage charts and old carbon parts when the manual gives none (common practice, no source). */
export const DEFAULT_TOLERANCE = 0.2;
/** A minimum insulation resistance of 1 MΩ at 500 V DC (in-service testing code of practice, Class I), used when none is given. */
export const DEFAULT_INSULATION_MIN = 1e6;

export interface MeasurementInput {
  quantity: MeasuredQuantity;
  /** As typed: the manual's value; for ESR and leakage, the capacitor's nominal capacitance; for insulation, the minimum. */
  expected?: string;
  /** As typed, in per cent ("10", "-20/+50"); ignored for ESR, leakage and insulation, which follow their rules. */
  tolerance?: string;
  /** As typed: the rated voltage, needed for ESR and leakage. */
  rating?: string;
  /** As typed: what the meter showed. */
  reading: string;
}

export interface MeasurementVerdict {
  verdict: 'within' | 'marginal' | 'out' | 'unknown';
  /** Signed fraction against the expected value or limit; null when there is nothing to compare with. */
  deviation: number | null;
  /** The verdict and why, in words a person can check. */
  reason: string;
  /** Parsed values in SI units. */
  reading: number;
  expected: number | null;
  rating: number | null;
  /** The limit or expected value the reading was judged against, in the reading's unit. */
  reference: number | null;
}

const read = (text: string, unit: Exclude<QuantityUnit, ''>, what: string) => {
  try {
    return parseQuantity(text, { expectUnit: unit }).value;
  } catch (err) {
    throw new BenchInputError(`${what}: ${(err as Error).message}`);
  }
};

/** Judges one bench reading: parses what was typed, applies the rule for its kind, and says why. */
export function measurementVerdict(input: MeasurementInput): MeasurementVerdict {
  const unit = quantityUnits[input.quantity];
  const reading = read(input.reading, unit, 'Reading');
  const expected = input.expected?.trim() ? read(input.expected, input.quantity === 'esr' || input.quantity === 'leakage' ? 'F' : unit, 'Expected value') : null;
  const rating = input.rating?.trim() ? read(input.rating, 'V', 'Rating') : null;
  if (['esr', 'capacitance', 'leakage', 'resistance', 'insulation', 'frequency'].includes(input.quantity) && reading < 0)
    throw new BenchInputError(`Reading: a ${input.quantity} cannot be negative.`);
  if (expected !== null && expected <= 0 && input.quantity !== 'dc-voltage')
    throw new BenchInputError('Expected value: must be above zero.');
  const show = (v: number, u: QuantityUnit = unit) => formatQuantity(v, u);
  const base = { reading, expected, rating };

  if (input.quantity === 'esr' || input.quantity === 'leakage') {
    if (expected === null || rating === null)
      return { ...base, verdict: 'unknown', deviation: null, reference: null, reason: 'Give the capacitor’s nominal capacitance and rated voltage to judge this reading.' };
    const limit = input.quantity === 'esr' ? esrLimitDetail(expected, rating) : leakageLimitDetail(expected, rating);
    const max = 'ohms' in limit ? limit.ohms : limit.amps;
    const rule = 'table' in limit ? `${limit.table}${limit.extrapolated ? ' (extrapolated)' : ''}` : limit.rule;
    // Up to twice the limit is "look again" rather than "condemn" (the ESR table's own advice; common practice for leakage).
    const verdict = reading <= max ? 'within' : reading <= 2 * max ? 'marginal' : 'out';
    return { ...base, verdict, deviation: (reading - max) / max, reference: max,
      reason: `Reads ${show(reading)} against an expected maximum of ${show(max)} for ${show(expected, 'F')} ${show(rating, 'V')} (${rule}): ${verdict}.` };
  }
  if (input.quantity === 'insulation') {
    const min = expected ?? DEFAULT_INSULATION_MIN;
    const verdict = reading >= min ? 'within' : 'out';
    return { ...base, verdict, deviation: (reading - min) / min, reference: min,
      reason: `Reads ${show(reading)} against a minimum of ${show(min)}${expected === null ? ' (1 MΩ at 500 V DC, Class I)' : ''}: ${verdict === 'within' ? 'passes' : 'fails'}.` };
  }
  if (expected === null) return { ...base, verdict: 'unknown', deviation: null, reference: null, reason: 'No expected value to compare with.' };
  const tolerance: Tolerance = input.tolerance?.trim() ? parseTolerance(input.tolerance) : DEFAULT_TOLERANCE;
  const { verdict, deviation } = readingVerdict({ expected, reading, tolerance });
  const band = typeof tolerance === 'number' ? `±${+(tolerance * 100).toFixed(2)} %` : `−${+(tolerance.minus * 100).toFixed(2)} %/+${+(tolerance.plus * 100).toFixed(2)} %`;
  const pct = `${deviation >= 0 ? '+' : '−'}${Math.abs(deviation * 100).toFixed(1)} %`;
  return { ...base, verdict, deviation, reference: expected,
    reason: `Reads ${show(reading)} against ${show(expected)} ${band}${input.tolerance?.trim() ? '' : ' (usual allowance)'}: ${pct}, ${verdict}.` };
}
