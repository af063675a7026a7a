import { frequencyTolerance } from './alignment';
import { BenchInputError } from './bench-input-error';
import { esrLimitDetail } from './esr-limit';
import { leakageLimitDetail } from './leakage-limit';
import { correctedForMeter, type MeterTexts } from './meter-text';
import { formatQuantity } from './quantity-format';
import { parseQuantity, type QuantityUnit } from './quantity-parse';
import { parseReading } from './reading-text';
import { readingVerdict, type Tolerance } from './reading-verdict';
import { parseTolerance } from './tolerance-text';
import { formatTolerance, signOf } from '../format';
import { describeDeviation, signedPercent, type LimitKind } from './verdict-words';

export const measuredQuantities = ['esr', 'capacitance', 'leakage', 'resistance', 'dc-voltage', 'ac-voltage', 'current', 'insulation', 'frequency'] as const;
export type MeasuredQuantity = (typeof measuredQuantities)[number];

/** The SI unit each kind of reading is in. */
export const quantityUnits: Record<MeasuredQuantity, Exclude<QuantityUnit, ''>> = {
  esr: 'Ω', capacitance: 'F', leakage: 'A', resistance: 'Ω', 'dc-voltage': 'V', 'ac-voltage': 'V', current: 'A', insulation: 'Ω', frequency: 'Hz',
};

/** How each kind is judged when the tolerance field does not say "max" or "min". */
export const limitKinds: Record<MeasuredQuantity, LimitKind> = {
  esr: 'maximum', leakage: 'maximum', insulation: 'minimum', capacitance: 'nominal', resistance: 'nominal',
  'dc-voltage': 'nominal', 'ac-voltage': 'nominal', current: 'nominal', frequency: 'nominal',
};

/** ±20 %: the usual allowance on voltage charts and old carbon parts when the manual gives none (common practice, no source). */
export const DEFAULT_TOLERANCE = 0.2;
/** An electrolytic's usual tolerance, −20 %/+50 % (IEC 60062 letter S), used for capacitances of 1 µF and more when none is typed. */
export const DEFAULT_ELECTROLYTIC_TOLERANCE = { minus: 0.2, plus: 0.5 } as const;
/** A minimum insulation resistance of 1 MΩ at 500 V DC (in-service testing code of practice, Class I), used when none is given. */
export const DEFAULT_INSULATION_MIN = 1e6;

const CANNOT_BE_NEGATIVE = new Set<MeasuredQuantity>(['esr', 'capacitance', 'leakage', 'resistance', 'insulation', 'frequency']);
const NAMES: Record<MeasuredQuantity, string> = {
  esr: 'an ESR', capacitance: 'a capacitance', leakage: 'a leakage current', resistance: 'a resistance', 'dc-voltage': 'a DC voltage',
  'ac-voltage': 'an AC voltage', current: 'a current', insulation: 'an insulation resistance', frequency: 'a frequency',
};

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

type Judged = Omit<MeasurementVerdict, 'summary' | 'expected' | 'rating' | 'limit' | 'overRange' | 'reading'> & { reading?: number; absolute?: boolean };
type Context = { reading: number | null; overRange: boolean; expected: number | null; rating: number | null; show: (v: number, u?: QuantityUnit) => string };

function againstRule(input: MeasurementInput, c: Context): Judged {
  if (c.expected === null || c.rating === null)
    return { verdict: 'unknown', deviation: null, reference: null, reason: 'Give the capacitor’s nominal capacitance and rated voltage to judge this reading.' };
  const limit = input.quantity === 'esr' ? esrLimitDetail(c.expected, c.rating) : leakageLimitDetail(c.expected, c.rating);
  const max = 'ohms' in limit ? limit.ohms : limit.amps;
  const rule = 'table' in limit ? `${limit.table}${limit.extrapolated ? ' (extrapolated)' : ''}` : limit.rule;
  const part = `${c.show(c.expected, 'F')} ${c.show(c.rating, 'V')}`;
  if (c.overRange)
    return { verdict: 'out', deviation: null, reference: max, reading: c.reading ?? max, reason: `Over range against an expected maximum of ${c.show(max)} for ${part} (${rule}): out; an open or dried-out part reads so.` };
  const reading = c.reading ?? 0;
  // Up to twice the limit is "look again" rather than "condemn" (the ESR table's own advice; common practice for leakage).
  const verdict = reading <= max ? 'within' : reading <= 2 * max ? 'marginal' : 'out';
  return { verdict, deviation: (reading - max) / max, reference: max, reason: `Reads ${c.show(reading)} against an expected maximum of ${c.show(max)} for ${part} (${rule}): ${verdict}.` };
}

function againstMinimum(min: number, source: string, c: Context): Judged {
  const reading = c.reading ?? min;
  const passes = c.overRange || reading >= min;
  const what = c.overRange ? (c.reading === null ? 'Over range' : `Over range (above ${c.show(reading)})`) : `Reads ${c.show(reading)}`;
  return { verdict: passes ? 'within' : 'out', deviation: c.overRange ? null : (reading - min) / min, reference: min, reading,
    reason: `${what}, ${passes ? 'above' : 'below'} the ${c.show(min)} minimum${source}: ${passes ? 'passes' : 'fails'}.` };
}

function againstMaximum(max: number, c: Context): Judged {
  if (c.overRange) return { verdict: 'out', deviation: null, reference: max, reading: c.reading ?? max, reason: `Over range, above the ${c.show(max)} maximum: fails.` };
  const reading = c.reading ?? 0;
  const passes = reading <= max;
  return { verdict: passes ? 'within' : 'out', deviation: (reading - max) / max, reference: max,
    reason: `Reads ${c.show(reading)}, ${passes ? 'within' : 'above'} the ${c.show(max)} maximum: ${passes ? 'passes' : 'fails'}.` };
}

function defaultTolerance(input: MeasurementInput, expected: number): { tolerance: Tolerance; words: string } {
  if (input.quantity === 'capacitance' && expected >= 1e-6)
    return { tolerance: { ...DEFAULT_ELECTROLYTIC_TOLERANCE }, words: 'the usual electrolytic tolerance, IEC 60062 letter S' };
  if (input.quantity === 'dc-voltage' || input.quantity === 'ac-voltage')
    return { tolerance: DEFAULT_TOLERANCE, words: 'the usual allowance on service charts when the manual states none; common practice' };
  return { tolerance: DEFAULT_TOLERANCE, words: 'usual allowance' };
}

function againstNominal(input: MeasurementInput, c: Context, expected: number): Judged {
  if (c.overRange)
    return { verdict: 'out', deviation: null, reference: expected, reading: c.reading ?? expected, reason: `Over range against ${c.show(expected)}: out; an open circuit or a value far above the expected one reads so.` };
  const typed = input.tolerance?.trim() ?? '';
  const reading = c.reading ?? 0;
  if (absoluteTolerance(input.quantity, typed)) {
    const tol = typed === '' ? frequencyTolerance(expected) : read(typed.replace(/^±\s*/, ''), 'Hz', 'Tolerance');
    const diff = reading - expected;
    const verdict = Math.abs(diff) <= tol ? 'within' : Math.abs(diff) <= 1.5 * tol ? 'marginal' : 'out';
    const off = `${signOf(diff, '+')}${c.show(Math.abs(diff))}`;
    return { verdict, deviation: diff / expected, reference: expected, absolute: true,
      reason: `Reads ${c.show(reading)} against ${c.show(expected)} ±${c.show(tol)}${typed === '' ? ' (usual alignment allowance; common practice)' : ''}: ${off}, ${verdict}.` };
  }
  const fallback = typed === '' ? defaultTolerance(input, expected) : undefined;
  const tolerance: Tolerance = fallback?.tolerance ?? parseTolerance(typed);
  // A bias typed positive (cathode to chassis) against a data sheet's negative grid bias: compare the sizes, and say so.
  const flipped = Math.sign(reading) * Math.sign(expected) === -1;
  const { verdict, deviation } = readingVerdict({ expected: Math.abs(expected), reading: Math.abs(reading), tolerance });
  const band = formatTolerance(tolerance, 4);
  const judged: Judged = { verdict, deviation, reference: expected,
    reason: `Reads ${c.show(reading)} against ${c.show(expected)} ${band}${fallback ? ` (${fallback.words})` : ''}: ${signedPercent(deviation)}${flipped ? ' in size' : ''}, ${verdict}.` };
  if (flipped)
    judged.hint = `The reading and the expected value have opposite signs. A data sheet writes grid bias as the grid relative to the cathode (negative); a meter from cathode to chassis reads the same bias as positive. Compared by size; check which way the meter was connected.`;
  return judged;
}

/** How a reading of this kind, with this tolerance text, is judged: "max"/"min" typed as the tolerance turn the expected value into a limit. */
export function limitOf(quantity: MeasuredQuantity, tolerance = ''): LimitKind {
  if (quantity === 'esr' || quantity === 'leakage' || quantity === 'insulation') return limitKinds[quantity];
  const typed = tolerance.trim().toLowerCase();
  if (/^(max|maximum|≤|<=)$/.test(typed)) return 'maximum';
  if (/^(min|minimum|≥|>=)$/.test(typed)) return 'minimum';
  return limitKinds[quantity];
}

/** A frequency is judged by an absolute tolerance (kHz off), unless a per cent is typed. */
export function absoluteTolerance(quantity: MeasuredQuantity, tolerance = ''): boolean {
  const typed = tolerance.trim().replace(/^±\s*/, '');
  return quantity === 'frequency' && (typed === '' || /[a-z]/i.test(typed));
}

// A tolerance printed after a part's value, as the part says it: "100n K", "47µ -20/+50", "2k2 ±5 %".
const MARKED_TOLERANCE = /^(.*\S)\s+(±?\s*\d+(?:\.\d+)?\s*%|[-\u2212]\s*\d+\s*%?\s*\/\s*\+\s*\d+\s*%?|\+\s*\d+\s*%?\s*\/\s*[-\u2212]\s*\d+\s*%?|[BCDFGJKMNSZP])$/;

/** Splits a part's marked tolerance off its value ("100n K" → "100n", "K") for capacitances and resistances. */
function markedTolerance(input: MeasurementInput): MeasurementInput {
  if (input.quantity !== 'capacitance' && input.quantity !== 'resistance') return input;
  if (input.tolerance?.trim() || !input.expected) return input;
  const match = MARKED_TOLERANCE.exec(input.expected.trim());
  return match ? { ...input, expected: match[1], tolerance: match[2] } : input;
}

/** Judges one bench reading: parses what was typed, applies the rule for its kind, and says why in words that fit the kind of limit. */
export function measurementVerdict(typed: MeasurementInput): MeasurementVerdict {
  const input = markedTolerance(typed);
  const unit = quantityUnits[input.quantity];
  const meter = readMeter(input.reading, unit);
  const expected = input.expected?.trim() ? read(input.expected, input.quantity === 'esr' || input.quantity === 'leakage' ? 'F' : unit, 'Expected value') : null;
  const rating = input.rating?.trim() ? read(input.rating, 'V', 'Rating') : null;
  if (CANNOT_BE_NEGATIVE.has(input.quantity) && meter.value !== null && meter.value < 0)
    throw new BenchInputError(`Reading: ${NAMES[input.quantity]} cannot be negative (${input.reading.trim()} typed). A meter shows a minus when its leads are reversed or not zeroed, or the part still holds a charge.`);
  if (expected !== null && expected <= 0 && input.quantity !== 'dc-voltage' && input.quantity !== 'current')
    throw new BenchInputError('Expected value: must be above zero.');
  const c: Context = { reading: meter.value, overRange: meter.overRange, expected, rating, show: (v, u = unit) => formatQuantity(v, u) };
  const limit = limitOf(input.quantity, input.tolerance);
  let judged: Judged;
  let meterWords: string | undefined;
  if (input.quantity === 'esr' || input.quantity === 'leakage') judged = againstRule(input, c);
  else if (input.quantity === 'insulation') judged = againstMinimum(expected ?? DEFAULT_INSULATION_MIN, expected === null ? ' (1 MΩ at 500 V DC, Class I)' : '', c);
  else if (expected === null) {
    judged = { verdict: 'unknown', deviation: null, reference: null, reason: meter.overRange ? 'Over range; no expected value to compare with.' : 'No expected value to compare with.' };
  } else if (limit === 'maximum') {
    judged = againstMaximum(expected, c);
  } else if (limit === 'minimum') {
    judged = againstMinimum(expected, '', c);
  } else {
    // A voltage chart taken with another meter: judge against what your meter should read there, not the chart's figure.
    const corrected = input.quantity === 'dc-voltage' || input.quantity === 'ac-voltage' ? correctedForMeter(expected, input) : undefined;
    judged = againstNominal(input, c, corrected?.volts ?? expected);
    if (corrected) {
      judged.reason = `${judged.reason} Judged against ${c.show(corrected.volts)}, what your meter should read where the chart says ${c.show(expected)}: ${corrected.words}`;
      meterWords = corrected.words;
    }
  }
  const { absolute, reading: judgedReading, ...rest } = judged;
  const reading = judgedReading ?? meter.value;
  if (reading === null) throw new BenchInputError("Reading: 'OL' is over range; give what it is judged against, or the range's top (\"> 20 M\"), so it can be recorded.");
  const summary = describeDeviation({ limit, reading: meter.value, reference: rest.reference, deviation: rest.deviation, unit, overRange: meter.overRange, absolute: absolute ?? false });
  return { ...rest, reading, expected, rating, limit, overRange: meter.overRange, summary, ...(meterWords ? { meterWords } : {}) };
}
