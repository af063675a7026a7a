import { BenchInputError } from './bench-input-error';
import type { Tolerance } from './reading-verdict';

const NUMBER = String.raw`(\d+(?:\.\d*)?|\.\d+)`;
const SYMMETRIC = new RegExp(`^\\+?${NUMBER}$`);
// Electrolytics are marked like −20 %/+50 %: below first, then above.
const ASYMMETRIC = new RegExp(`^-${NUMBER}/\\+?${NUMBER}$`);

/** Reads a tolerance typed in per cent ("10", "±10 %", "5%", "-20/+50") as fractions for readingVerdict. */
export function parseTolerance(text: string): Tolerance {
  const compact = text.trim().replace(/[\s%±]/g, '').replace(/[\u2212\u2013]/g, '-');
  const pair = ASYMMETRIC.exec(compact);
  const single = pair === null ? SYMMETRIC.exec(compact) : null;
  if (!pair && !single)
    throw new BenchInputError(`'${text}' is not a tolerance Gridleak can read: write it in per cent, like 10 for ±10 %, or -20/+50 for an electrolytic.`);
  const below = Number(pair?.[1] ?? single?.[1]);
  const above = Number(pair?.[2] ?? single?.[1]);
  if (below > 100) throw new BenchInputError(`'${text}': a value cannot fall more than 100 % below what is expected.`);
  return single ? below / 100 : { minus: below / 100, plus: above / 100 };
}
