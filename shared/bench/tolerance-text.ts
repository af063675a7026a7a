import { BenchInputError } from './bench-input-error';
import type { Tolerance } from './reading-verdict';

const NUMBER = String.raw`(\d+(?:\.\d*)?|\.\d+)`;
const SYMMETRIC = new RegExp(`^\\+?${NUMBER}$`);
// Electrolytics are marked −20 %/+50 % (below first) or +50/−20 (above first); both orders are read.
const BELOW_FIRST = new RegExp(`^-${NUMBER}/\\+?${NUMBER}$`);
const ABOVE_FIRST = new RegExp(`^\\+${NUMBER}/-${NUMBER}$`);

/**
 * IEC 60062 tolerance letters, as fractions. B, C and D are per cent here (they mean pF below 10 pF,
 * which a per-cent band cannot say). S and Z are the electrolytic bands.
 */
export const TOLERANCE_LETTERS: Readonly<Record<string, Tolerance>> = {
  B: 0.001,
  C: 0.0025,
  D: 0.005,
  F: 0.01,
  G: 0.02,
  J: 0.05,
  K: 0.1,
  M: 0.2,
  N: 0.3,
  S: { minus: 0.2, plus: 0.5 },
  Z: { minus: 0.2, plus: 0.8 },
  P: { minus: 0, plus: 1 },
};

/**
 * Reads a tolerance typed in per cent ("10", "±10 %", "5%", "-20/+50", "−20/+80", "+50/-20") or as an
 * IEC 60062 letter ("K", "J", "Z"), as fractions for readingVerdict.
 */
export function parseTolerance(text: string): Tolerance {
  const compact = String(text)
    .trim()
    .replace(/[\s%±]/g, '')
    .replace(/[\u2212\u2013]/g, '-');
  const letter = TOLERANCE_LETTERS[compact.toUpperCase()];
  if (compact.length === 1 && letter !== undefined) return letter;
  const below = BELOW_FIRST.exec(compact);
  const above = below === null ? ABOVE_FIRST.exec(compact) : null;
  const single = below === null && above === null ? SYMMETRIC.exec(compact) : null;
  if (!below && !above && !single)
    throw new BenchInputError(
      `'${text}' is not a tolerance Gridleak can read: write it in per cent, like 10 for ±10 %, -20/+50 for an electrolytic, or as a letter (J, K, M, Z).`,
    );
  const minus = Number(below?.[1] ?? above?.[2] ?? single?.[1]);
  const plus = Number(below?.[2] ?? above?.[1] ?? single?.[1]);
  if (minus > 100) throw new BenchInputError(`'${text}': a value cannot fall more than 100 % below what is expected.`);
  return single ? minus / 100 : { minus: minus / 100, plus: plus / 100 };
}
