import type { Tolerance } from '../../../../shared/bench';
import { formatNumber } from './format';

/** A tolerance field read: the fraction(s) for readingVerdict and how it was understood, or why not. */
export interface ToleranceReading {
  tolerance?: Tolerance;
  display?: string;
  error?: string;
}

const NUMBER = String.raw`(\d+(?:\.\d*)?|\.\d+)`;
const SYMMETRIC = new RegExp(`^\\+?${NUMBER}$`);
// Electrolytics are marked like −20 %/+50 %: below first, then above.
const ASYMMETRIC = new RegExp(`^-${NUMBER}/\\+?${NUMBER}$`);

function fail(text: string, why: string): ToleranceReading {
  return {
    error:
      `'${text}' is not a tolerance Gridleak can read: ${why}. ` +
      'Write it in per cent, like 10 for ±10 %, or -20/+50 for an electrolytic.',
  };
}

/** Reads a tolerance typed in per cent: "10", "±10 %", "5%", "-20/+50", "−20 % / +50 %". */
export function readTolerance(text: string): ToleranceReading {
  const trimmed = text.trim();
  if (trimmed === '') return {};
  const compact = trimmed.replace(/[\s%±]/g, '').replace(/[\u2212\u2013]/g, '-');
  const pair = ASYMMETRIC.exec(compact);
  const single = pair === null ? SYMMETRIC.exec(compact) : null;
  const below = Number(pair?.[1] ?? single?.[1]);
  const above = Number(pair?.[2] ?? single?.[1]);
  if (pair === null && single === null) return fail(trimmed, 'it is not a number of per cent');
  if (below > 100) return fail(trimmed, 'a value cannot fall more than 100 % below what is expected');
  if (single !== null) return { tolerance: below / 100, display: `±${formatNumber(below, 4)} %` };
  return {
    tolerance: { minus: below / 100, plus: above / 100 },
    display: `\u2212${formatNumber(below, 4)} % / +${formatNumber(above, 4)} %`,
  };
}
