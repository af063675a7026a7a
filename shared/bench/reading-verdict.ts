import { BenchInputError, requireFinite, requireNonNegative } from './bench-input-error';

/** Tolerance as a fraction (0.1 = ±10 %), or asymmetric fractions below and above (electrolytics: −20 %/+50 %). */
export type Tolerance = number | { minus: number; plus: number };

export interface ReadingVerdict {
  /**
   * 'within': inside the tolerance band. 'marginal': outside it, but by no more than half the
   * band again (within 1.5 × tolerance) — read again, allow for the meter, do not condemn yet.
   * 'out': beyond 1.5 × tolerance.
   */
  verdict: 'within' | 'marginal' | 'out';
  /** Signed fraction (reading − expected) / expected; for a negative expected value, positive means larger in magnitude. */
  deviation: number;
}

/** How far beyond the tolerance a reading may go and still be called marginal. */
const MARGINAL_FACTOR = 1.5;
// Float arithmetic puts a 5 % reading a hair past 0.05 (4935 Ω against 4.7 kΩ); forgive that much.
const SLACK = 1e-9;

function bandsOf(tolerance: Tolerance): { minus: number; plus: number } {
  const pair = typeof tolerance === 'number' ? { minus: tolerance, plus: tolerance } : tolerance;
  if (pair === null || typeof pair !== 'object') {
    throw new BenchInputError('Give the tolerance as a fraction (0.1 for ±10 %) or as { minus, plus } fractions.');
  }
  const minus = requireNonNegative(pair.minus, 'tolerance below the expected value (fraction)');
  const plus = requireNonNegative(pair.plus, 'tolerance above the expected value (fraction)');
  if (minus > 1) {
    throw new BenchInputError(
      `A tolerance of ${minus} below is more than 100 %; tolerances are fractions, so ±10 % is 0.1.`,
    );
  }
  return { minus, plus };
}

/**
 * Compares a bench reading with the expected value (both in the same unit, any SI unit) under a
 * tolerance given as a fraction or { minus, plus } fractions; returns the verdict and the signed deviation.
 */
export function readingVerdict({
  expected,
  reading,
  tolerance,
}: {
  expected: number;
  reading: number;
  tolerance: Tolerance;
}): ReadingVerdict {
  requireFinite(expected, 'expected value');
  requireFinite(reading, 'reading');
  if (expected === 0) {
    throw new BenchInputError(
      'The expected value is 0, so a relative tolerance means nothing; compare against an absolute limit instead.',
    );
  }
  const { minus, plus } = bandsOf(tolerance);
  const deviation = (reading - expected) / expected;
  const band = deviation < 0 ? minus : plus;
  const size = Math.abs(deviation);
  if (size <= band + SLACK) return { verdict: 'within', deviation };
  if (size <= band * MARGINAL_FACTOR + SLACK) return { verdict: 'marginal', deviation };
  return { verdict: 'out', deviation };
}
