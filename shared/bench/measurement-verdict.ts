import { BenchInputError } from './bench-input-error';
import { correctedForMeter, type MeterTexts } from './meter-text';
import { formatQuantity } from './quantity-format';
import { parseQuantity, type QuantityUnit } from './quantity-parse';
import { parseReading } from './reading-text';
import { absoluteTolerance, limitOf } from './reading-kind-rules';
import { readingKinds, type MeasuredQuantity, type ReadingKind } from './reading-kinds';
import { readingVerdict, type Tolerance } from './reading-verdict';
import { parseTolerance } from './tolerance-text';
import { formatTolerance, signOf } from '../format';
import { describeDeviation, signedPercent, type LimitKind } from './verdict-words';

export interface MeasurementInput extends MeterTexts {
  quantity: MeasuredQuantity;
  /**
   * As typed: the manual's value; for ESR and leakage, the capacitor's nominal capacitance; for insulation, the minimum.
   * A capacitance or resistance may carry its marked tolerance after a space ("100n K", "47µ -20/+50") when none is typed.
   */
  expected?: string;
  /**
   * As typed: per cent ("10", "-20/+50", "+50/-20"), an IEC 60062 letter ("K", "Z"), an absolute amount with its unit
   * for a frequency ("2 kHz"), or "max"/"min" to judge against the expected value as a limit. Ignored for ESR, leakage
   * and insulation, which follow their rules.
   */
  tolerance?: string;
  /** As typed: the rated voltage, needed for ESR and leakage. */
  rating?: string;
  /** As typed: what the meter showed; "OL" or "> 200 M" is kept as over range. */
  reading: string;
}

export interface MeasurementVerdict {
  verdict: 'within' | 'marginal' | 'out' | 'unknown';
  /** Signed fraction against the expected value or limit; null when there is nothing to compare with (or over range). */
  deviation: number | null;
  /** The verdict and why, in words a person can check. */
  reason: string;
  /** Parsed values in SI units. For an over-range reading, the bound written, else the limit it is known to exceed. */
  reading: number;
  expected: number | null;
  rating: number | null;
  /** The limit or expected value the reading was judged against, in the reading's unit. */
  reference: number | null;
  /** Whether the reference is a maximum, a minimum or a nominal value. */
  limit: LimitKind;
  /** The meter showed over range. */
  overRange: boolean;
  /** The deviation in words that fit the limit ("200 MΩ, above the 2 MΩ minimum", "+12.8 %"). */
  summary: string;
  /** A note on how the reading may have been taken (a bias typed with the other sign). */
  hint?: string;
  /** For a voltage with the chart's meter, yours and the source resistance given: the correction in words. */
  meterWords?: string;
}

const read = (text: string, unit: Exclude<QuantityUnit, ''>, what: string) => {
  try {
    return parseQuantity(text, { expectUnit: unit }).value;
  } catch (err) {
    throw new BenchInputError(`${what}: ${(err as Error).message}`);
  }
};

const readMeter = (text: string, unit: Exclude<QuantityUnit, ''>) => {
  try {
    return parseReading(text, { expectUnit: unit });
  } catch (err) {
    throw new BenchInputError(`Reading: ${(err as Error).message}`);
  }
};

type Judged = Omit<MeasurementVerdict, 'summary' | 'expected' | 'rating' | 'limit' | 'overRange' | 'reading'> & {
  reading?: number;
  absolute?: boolean;
};
type Context = {
  reading: number | null;
  overRange: boolean;
  expected: number | null;
  rating: number | null;
  show: (v: number, u?: QuantityUnit) => string;
};
type Rule<T extends ReadingKind['rule']['type']> = Extract<ReadingKind['rule'], { type: T }>;

/** Over the meter's range against a reference: out, the reading taken as the reference when none was typed. */
const overRange = (c: Context, reference: number, reason: string): Judged => ({
  verdict: 'out',
  deviation: null,
  reference,
  reading: c.reading ?? reference,
  reason,
});

function againstCapacitorLimit(rule: Rule<'capacitor-limit'>, c: Context): Judged {
  if (c.expected === null || c.rating === null)
    return {
      verdict: 'unknown',
      deviation: null,
      reference: null,
      reason: 'Give the capacitor’s nominal capacitance and rated voltage to judge this reading.',
    };
  const { value: max, source } = rule.limit(c.expected, c.rating);
  const part = `${c.show(c.expected, 'F')} ${c.show(c.rating, 'V')}`;
  if (c.overRange)
    return overRange(
      c,
      max,
      `Over range against an expected maximum of ${c.show(max)} for ${part} (${source}): out; an open or dried-out part reads so.`,
    );
  const reading = c.reading ?? 0;
  // Up to twice the limit is "look again" rather than "condemn" (the ESR table's own advice; common practice for leakage).
  const verdict = reading <= max ? 'within' : reading <= 2 * max ? 'marginal' : 'out';
  return {
    verdict,
    deviation: (reading - max) / max,
    reference: max,
    reason: `Reads ${c.show(reading)} against an expected maximum of ${c.show(max)} for ${part} (${source}): ${verdict}.`,
  };
}

function againstMinimum(min: number, source: string, c: Context): Judged {
  const reading = c.reading ?? min;
  const passes = c.overRange || reading >= min;
  const what = c.overRange
    ? c.reading === null
      ? 'Over range'
      : `Over range (above ${c.show(reading)})`
    : `Reads ${c.show(reading)}`;
  return {
    verdict: passes ? 'within' : 'out',
    deviation: c.overRange ? null : (reading - min) / min,
    reference: min,
    reading,
    reason: `${what}, ${passes ? 'above' : 'below'} the ${c.show(min)} minimum${source}: ${passes ? 'passes' : 'fails'}.`,
  };
}

function againstMaximum(max: number, source: string, c: Context): Judged {
  if (c.overRange) return overRange(c, max, `Over range, above the ${c.show(max)} maximum${source}: fails.`);
  const reading = c.reading ?? 0;
  const passes = reading <= max;
  return {
    verdict: passes ? 'within' : 'out',
    deviation: (reading - max) / max,
    reference: max,
    reason: `Reads ${c.show(reading)}, ${passes ? 'within' : 'above'} the ${c.show(max)} maximum${source}: ${passes ? 'passes' : 'fails'}.`,
  };
}

function againstBand(rule: Rule<'band'>, input: MeasurementInput, c: Context, expected: number): Judged {
  if (c.overRange)
    return overRange(
      c,
      expected,
      `Over range against ${c.show(expected)}: out; an open circuit or a value far above the expected one reads so.`,
    );
  const typed = input.tolerance?.trim() ?? '';
  const reading = c.reading ?? 0;
  const usual = typed === '' ? rule.usual(expected) : undefined;
  if (absoluteTolerance(input.quantity, typed)) {
    const tol =
      usual && 'amount' in usual
        ? usual.amount
        : read(typed.replace(/^±\s*/, ''), readingKinds[input.quantity].unit, 'Tolerance');
    const diff = reading - expected;
    const verdict = Math.abs(diff) <= tol ? 'within' : Math.abs(diff) <= 1.5 * tol ? 'marginal' : 'out';
    const off = `${signOf(diff, '+')}${c.show(Math.abs(diff))}`;
    return {
      verdict,
      deviation: diff / expected,
      reference: expected,
      absolute: true,
      reason: `Reads ${c.show(reading)} against ${c.show(expected)} ±${c.show(tol)}${usual ? ` (${usual.words})` : ''}: ${off}, ${verdict}.`,
    };
  }
  const tolerance: Tolerance = usual && 'tolerance' in usual ? usual.tolerance : parseTolerance(typed);
  // A bias typed positive (cathode to chassis) against a data sheet's negative grid bias: compare the sizes, and say so.
  const flipped = Math.sign(reading) * Math.sign(expected) === -1;
  const { verdict, deviation } = readingVerdict({
    expected: Math.abs(expected),
    reading: Math.abs(reading),
    tolerance,
  });
  const band = formatTolerance(tolerance, 4);
  const judged: Judged = {
    verdict,
    deviation,
    reference: expected,
    reason: `Reads ${c.show(reading)} against ${c.show(expected)} ${band}${usual ? ` (${usual.words})` : ''}: ${signedPercent(deviation)}${flipped ? ' in size' : ''}, ${verdict}.`,
  };
  if (flipped)
    judged.hint = `The reading and the expected value have opposite signs. A data sheet writes grid bias as the grid relative to the cathode (negative); a meter from cathode to chassis reads the same bias as positive. Compared by size; check which way the meter was connected.`;
  return judged;
}

// A tolerance printed after a part's value, as the part says it: "100n K", "47µ -20/+50", "2k2 ±5 %".
const MARKED_TOLERANCE =
  /^(.*\S)\s+(±?\s*\d+(?:\.\d+)?\s*%|[-\u2212]\s*\d+\s*%?\s*\/\s*\+\s*\d+\s*%?|\+\s*\d+\s*%?\s*\/\s*[-\u2212]\s*\d+\s*%?|[BCDFGJKMNSZP])$/;

/** Splits a part's marked tolerance off its value ("100n K" → "100n", "K") for kinds whose parts carry one. */
function markedTolerance(input: MeasurementInput): MeasurementInput {
  const rule = readingKinds[input.quantity].rule;
  if (rule.type !== 'band' || !rule.marked) return input;
  if (input.tolerance?.trim() || !input.expected) return input;
  const match = MARKED_TOLERANCE.exec(input.expected.trim());
  return match ? { ...input, expected: match[1], tolerance: match[2] } : input;
}

/** Judges by the kind's rule; a band with "max"/"min" typed is judged against that limit. */
function judgeByRule(input: MeasurementInput, c: Context, limit: LimitKind): { judged: Judged; meterWords?: string } {
  const rule = readingKinds[input.quantity].rule;
  if (rule.type === 'capacitor-limit') return { judged: againstCapacitorLimit(rule, c) };
  const given = c.expected ?? (rule.type === 'band' ? undefined : rule.default?.value);
  if (given === undefined)
    return {
      judged: {
        verdict: 'unknown',
        deviation: null,
        reference: null,
        reason: c.overRange ? 'Over range; no expected value to compare with.' : 'No expected value to compare with.',
      },
    };
  const source = c.expected === null && rule.type !== 'band' && rule.default ? ` (${rule.default.source})` : '';
  if (limit === 'minimum') return { judged: againstMinimum(given, source, c) };
  if (limit === 'maximum') return { judged: againstMaximum(given, source, c) };
  if (rule.type !== 'band') throw new Error('unreachable: only a band is judged about a nominal value');
  // A voltage chart taken with another meter: judge against what your meter should read there, not the chart's figure.
  const corrected = rule.meterLoading ? correctedForMeter(given, input) : undefined;
  const judged = againstBand(rule, input, c, corrected?.volts ?? given);
  if (!corrected) return { judged };
  judged.reason = `${judged.reason} Judged against ${c.show(corrected.volts)}, what your meter should read where the chart says ${c.show(given)}: ${corrected.words}`;
  return { judged, meterWords: corrected.words };
}

/** Judges one bench reading: parses what was typed, applies the rule for its kind, and says why in words that fit the kind of limit. */
export function measurementVerdict(typed: MeasurementInput): MeasurementVerdict {
  const input = markedTolerance(typed);
  const kind = readingKinds[input.quantity];
  const unit = kind.unit;
  const meter = readMeter(input.reading, unit);
  const expected = input.expected?.trim()
    ? read(input.expected, kind.rule.type === 'capacitor-limit' ? 'F' : unit, 'Expected value')
    : null;
  const rating = input.rating?.trim() ? read(input.rating, 'V', 'Rating') : null;
  if (kind.sign.reading === 'not-negative' && meter.value !== null && meter.value < 0)
    throw new BenchInputError(
      `Reading: ${kind.noun} cannot be negative (${input.reading.trim()} typed). ${kind.sign.minusCause ?? 'A meter shows a minus when its leads are reversed or not zeroed, or the part still holds a charge.'}`,
    );
  if (expected !== null && expected <= 0 && kind.sign.expected === 'above-zero')
    throw new BenchInputError('Expected value: must be above zero.');
  const c: Context = {
    reading: meter.value,
    overRange: meter.overRange,
    expected,
    rating,
    show: (v, u = unit) => formatQuantity(v, u),
  };
  const limit = limitOf(input.quantity, input.tolerance);
  const { judged, meterWords } = judgeByRule(input, c, limit);
  const { absolute, reading: judgedReading, ...rest } = judged;
  const reading = judgedReading ?? meter.value;
  if (reading === null)
    throw new BenchInputError(
      "Reading: 'OL' is over range; give what it is judged against, or the range's top (\"> 20 M\"), so it can be recorded.",
    );
  const summary = describeDeviation({
    limit,
    reading: meter.value,
    reference: rest.reference,
    deviation: rest.deviation,
    unit,
    overRange: meter.overRange,
    absolute: absolute ?? false,
  });
  return {
    ...rest,
    reading,
    expected,
    rating,
    limit,
    overRange: meter.overRange,
    summary,
    ...(meterWords ? { meterWords } : {}),
  };
}
