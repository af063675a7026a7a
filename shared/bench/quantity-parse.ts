import { BenchInputError, scaleByPowerOfTen } from './bench-input-error';

/** Units the bench library reads and writes; '' when the text gives none. */
export type QuantityUnit = '' | 'Ω' | 'F' | 'V' | 'A' | 'Hz' | 'W' | 's' | 'J';

/** A parsed value in SI base units (ohms, farads, volts, amperes, hertz, watts, seconds, joules). */
export interface Quantity {
  value: number;
  unit: QuantityUnit;
}

export interface ParseQuantityOptions {
  /**
   * The unit the caller expects (e.g. 'F' for a capacitor field). A bare number then takes this
   * unit, a different written unit is refused, and an RKM 'M' reads as micro (M47 = 0.47 µF),
   * the habit of old European diagrams (as does writing 'M47 F'). Otherwise 'M47' is 0.47 MΩ,
   * as IEC 60062 reads it.
   */
  expectUnit?: Exclude<QuantityUnit, ''>;
}

const PREFIX_EXPONENTS: Record<string, number> = {
  p: -12,
  n: -9,
  u: -6,
  U: -6,
  µ: -6,
  μ: -6,
  m: -3,
  k: 3,
  K: 3,
  M: 6,
  G: 9,
};

// IEC 60062 letter-and-digit (RKM) code: the letter stands where the decimal point would.
// Upper-case letters are resistance letters, lower-case (and F) capacitance letters.
const RKM_LETTERS: Record<string, { exponent: number; unit: 'Ω' | 'F' }> = {
  L: { exponent: -3, unit: 'Ω' },
  R: { exponent: 0, unit: 'Ω' },
  K: { exponent: 3, unit: 'Ω' },
  k: { exponent: 3, unit: 'Ω' },
  M: { exponent: 6, unit: 'Ω' },
  G: { exponent: 9, unit: 'Ω' },
  p: { exponent: -12, unit: 'F' },
  n: { exponent: -9, unit: 'F' },
  u: { exponent: -6, unit: 'F' },
  µ: { exponent: -6, unit: 'F' },
  μ: { exponent: -6, unit: 'F' },
  m: { exponent: -3, unit: 'F' },
  F: { exponent: 0, unit: 'F' },
};

// Unit words are matched case-insensitively ("47uf", "250v" are how people type), spaces and dots dropped.
// Voltage ratings carry the marking's own words: VDC, WV (working volts), WVDC, DCWV, VAC, "V DC".
const UNIT_WORDS: Record<string, QuantityUnit> = {
  ω: 'Ω',
  ohm: 'Ω',
  ohms: 'Ω',
  f: 'F',
  v: 'V',
  a: 'A',
  hz: 'Hz',
  w: 'W',
  j: 'J',
  vdc: 'V',
  vac: 'V',
  wv: 'V',
  wvdc: 'V',
  dcwv: 'V',
  vdcw: 'V',
  vw: 'V',
  vrms: 'V',
};

// Words that carry their own scale. Old American markings: mfd and MF = µF (never megafarads on a
// capacitor), mmfd and MMF = pF; "meg" = megohms, as old parts lists write resistors.
const SCALED_WORDS: Record<string, { exponent: number; unit: QuantityUnit }> = {
  mfd: { exponent: -6, unit: 'F' },
  mf: { exponent: -6, unit: 'F' },
  mmfd: { exponent: -12, unit: 'F' },
  mmf: { exponent: -12, unit: 'F' },
  meg: { exponent: 6, unit: 'Ω' },
  megs: { exponent: 6, unit: 'Ω' },
  megohm: { exponent: 6, unit: 'Ω' },
  megohms: { exponent: 6, unit: 'Ω' },
  r: { exponent: 0, unit: 'Ω' },
};

/** The suffix as a lookup key: lower case, no spaces or dots ("V DC" → "vdc", "W.V." → "wv"). */
const compactWord = (text: string) => text.toLowerCase().replace(/[\s.]/g, '');

const RKM_PATTERN = /^([+-]?)(\d*)([LRKkMGpnuµμmF])(\d+)\s*(.*)$/;
const DECIMAL_PATTERN = /^([+-]?)(\d+(?:\.\d*)?|\.\d+)(?:[eE]([+-]?\d+))?\s*(.*)$/;

function unitWord(text: string): QuantityUnit | undefined {
  if (text === 's') return 's'; // upper-case S would be siemens, so seconds stay exact
  return UNIT_WORDS[compactWord(text)];
}

function fail(text: string, why: string): never {
  throw new BenchInputError(
    `'${text}' is not a value Gridleak can read: ${why}. Write it like 4.7k, 4k7, 330R, 6n8, 0.02 µF or 350 V.`,
  );
}

function settleUnit(text: string, written: QuantityUnit, options: ParseQuantityOptions): QuantityUnit {
  const expected = options.expectUnit;
  if (expected === undefined) return written;
  if (written === '') return expected;
  if (written !== expected) fail(text, `it is in ${written} but ${expected} was expected here`);
  return written;
}

function parseRkm(text: string, match: RegExpExecArray, options: ParseQuantityOptions): Quantity {
  const [, sign = '', before = '', letter = '', after = '', rest = ''] = match;
  const rule = RKM_LETTERS[letter];
  if (rule === undefined) fail(text, `'${letter}' is not a letter of the IEC 60062 code`);
  // Old European diagrams write M for micro in capacitances (M47 = 0.47 µF): only when F is written or expected.
  const capacitanceM = letter === 'M' && (options.expectUnit === 'F' || unitWord(rest) === 'F');
  const exponent = capacitanceM ? -6 : rule.exponent;
  const impliedUnit = capacitanceM ? 'F' : rule.unit;
  const written = rest === '' ? impliedUnit : unitWord(rest);
  if (written === undefined) fail(text, `'${rest}' is not a unit (use Ω or F after a letter code)`);
  if (written !== impliedUnit) {
    fail(text, `the code letter '${letter}' stands for ${impliedUnit === 'Ω' ? 'ohms' : 'farads'}, not ${written}`);
  }
  const value = scaleByPowerOfTen(`${sign}${before === '' ? '0' : before}.${after}`, exponent);
  return { value, unit: settleUnit(text, written, options) };
}

function parseDecimal(text: string, match: RegExpExecArray, options: ParseQuantityOptions): Quantity {
  const [, sign = '', digits = '', ownExponent = '0', suffix = ''] = match;
  let exponent = Number(ownExponent);
  let unit: QuantityUnit | undefined = suffix === '' ? '' : unitWord(suffix);
  // "mF" written exactly so is the SI millifarad; any other spelling of mf is the old American microfarad.
  const scaled = suffix === 'mF' ? undefined : SCALED_WORDS[compactWord(suffix)];
  if (unit === undefined && scaled !== undefined) {
    exponent += scaled.exponent;
    unit = scaled.unit;
  }
  if (unit === undefined) {
    const prefix = PREFIX_EXPONENTS[suffix.charAt(0)];
    const remainder = suffix.slice(1).trim();
    const afterPrefix = remainder === '' ? '' : unitWord(remainder);
    if (prefix === undefined || afterPrefix === undefined) {
      fail(text, `'${suffix}' is not an SI prefix (p n µ m k M G) and a unit (Ω F V A Hz W s J)`);
    }
    exponent += prefix;
    unit = afterPrefix;
  }
  const value = scaleByPowerOfTen(`${sign}${digits}`, exponent);
  if (!Number.isFinite(value)) fail(text, 'the number is too large');
  return { value, unit: settleUnit(text, unit, options) };
}

/**
 * Reads a written value: text like "4.7 kΩ", "47k", "4k7", "R47", "47R", "3n3", "32µF", "47UF", "0.05 mfd", "8 MF",
 * "4.7 meg", "350 WVDC", "1.6 kV", "−7.3 V";
 * returns the value in SI base units (Ω, F, V, A, Hz, W, s, J) and the unit ('' when none written).
 * An RKM code implies its unit: resistance letters give 'Ω', capacitance letters give 'F'.
 * A leading minus is allowed because bias voltages are negative.
 */
export function parseQuantity(text: string, options: ParseQuantityOptions = {}): Quantity {
  if (typeof text !== 'string' || text.trim() === '') {
    throw new BenchInputError('Enter a value, for example 4.7k, 4k7, 330R, 6n8, 0.02 µF or 350 V.');
  }
  // The true minus sign (U+2212, as Gridleak prints it) and a dash typed in its place read as a minus.
  const trimmed = text.trim().replace(/^[\u2212\u2013]/, '-');
  if (/^(?:OL|O\.L\.?|over\s*range|>)/i.test(trimmed)) {
    fail(
      trimmed,
      'it is an over-range reading, not a value; record it as a reading, where "OL" or "> 200 M" is kept as over range',
    );
  }
  if (/\d,\d/.test(trimmed)) {
    fail(trimmed, 'use a point for the decimal separator (4.7k) or the letter code (4k7)');
  }
  const rkm = RKM_PATTERN.exec(trimmed);
  if (rkm !== null) return parseRkm(trimmed, rkm, options);
  const decimal = DECIMAL_PATTERN.exec(trimmed);
  if (decimal !== null) return parseDecimal(trimmed, decimal, options);
  return fail(trimmed, 'it does not start with a number or a letter code');
}
