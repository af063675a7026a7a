// Tables of the European valve type code (heater letter, system letters, base digits), as the
// numbering-systems articles and valve data handbooks list them.
// Where the reference pages disagree, the note says so rather than choosing silently.

export type HeaterSupply = 'parallel' | 'series' | 'battery' | 'none';

export interface HeaterLetter {
  supply: HeaterSupply;
  /** Heater voltage in volts, where the letter fixes it (parallel and battery types). */
  volts?: number;
  /** Heater current in amperes, where the letter fixes it (series-string types). */
  amps?: number;
  note?: string;
}

export const HEATER_LETTERS: Readonly<Record<string, HeaterLetter>> = {
  A: { supply: 'parallel', volts: 4 },
  B: { supply: 'series', amps: 0.18 },
  C: { supply: 'series', amps: 0.2, note: 'AC/DC series string' },
  D: { supply: 'battery', volts: 1.4, note: '1.25/1.4 V; some types 0.625 V' },
  E: { supply: 'parallel', volts: 6.3, note: 'also car battery' },
  F: { supply: 'parallel', volts: 12.6, note: 'car; one source says 13 V' },
  G: { supply: 'parallel', volts: 5, note: 'later used for miscellaneous types' },
  H: { supply: 'series', amps: 0.15, note: 'very early types: 4 V battery' },
  K: { supply: 'battery', volts: 2 },
  O: { supply: 'none', note: 'sources disagree: no heater (cold cathode) or 150 mA series' },
  P: { supply: 'series', amps: 0.3, note: 'mostly television' },
  U: { supply: 'series', amps: 0.1, note: 'AC/DC radio series string' },
  V: { supply: 'series', amps: 0.05 },
  X: { supply: 'series', amps: 0.6, note: 'one list says 450 mA' },
  Y: { supply: 'series', amps: 0.45 },
};

export const SYSTEM_LETTERS: Readonly<Record<string, string>> = {
  A: 'single signal diode',
  B: 'double diode, common cathode',
  C: 'small-signal triode',
  D: 'power triode',
  E: 'small-signal tetrode',
  F: 'small-signal pentode',
  H: 'hexode or heptode (hexode type)',
  K: 'octode or heptode (octode type)',
  L: 'power pentode or beam tetrode',
  M: 'tuning indicator',
  N: 'thyratron',
  P: 'secondary-emission valve',
  Q: 'nonode',
  T: 'miscellaneous',
  W: 'gas-filled half-wave rectifier',
  X: 'gas-filled full-wave rectifier',
  Y: 'half-wave rectifier',
  Z: 'full-wave rectifier',
};

const NOVAL = 'noval (B9A)';
const B7G = 'miniature (B7G)';

/** Base from two digits, per the 0–99 ranges. */
function baseOfTwoDigits(n: number, heater: string): string {
  if (n < 20) return 'older or miscellaneous base (side-contact P8A, steel Y8A or octal)';
  if (n < 30) return heater === 'D' ? 'international octal (D-series 2x)' : 'loctal (B8G)';
  if (n < 40) return 'international octal';
  if (n < 50) return 'Rimlock (B8A)';
  if (n < 60) return 'miscellaneous (includes B9G)';
  if (n < 80) return 'subminiature';
  if (n < 90) return NOVAL;
  return B7G;
}

/**
 * Base named by the designation's number (1–3 digits). Uses the explicit table rather than
 * "ignore the first digit above 100", which gets PL504 (5xx = magnoval) and 8xx types wrong.
 */
export function baseOfNumber(digits: string, heater: string): string {
  const n = Number(digits);
  if (digits.length < 3) return baseOfTwoDigits(n, heater);
  const hundreds = Math.floor(n / 100);
  if (hundreds === 1) return baseOfTwoDigits(n % 100, heater);
  if (hundreds === 2) return 'decal (B10B)';
  if (hundreds === 5) return 'magnoval (B9D)';
  if (hundreds === 8) return NOVAL;
  if (hundreds === 9) return B7G;
  return 'unknown (number range not in the base table)';
}
