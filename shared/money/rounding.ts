/**
 * Integer division with a stated rounding, for amounts in minor units. `numerator / denominator` is never
 * computed in floating point: halves are decided exactly.
 */
export type Rounding = 'half-up' | 'down';

/** Rounds numerator / denominator (denominator > 0) to a whole number; negatives mirror positives. */
export function divideRounded(numerator: number, denominator: number, rounding: Rounding): number {
  if (!Number.isSafeInteger(numerator) || !Number.isSafeInteger(denominator) || denominator <= 0)
    throw new RangeError('divideRounded takes whole numbers and a positive denominator.');
  const sign = numerator < 0 ? -1 : 1;
  const n = BigInt(Math.abs(numerator));
  const d = BigInt(denominator);
  const q = rounding === 'down' ? n / d : (2n * n + d) / (2n * d);
  const result = sign * Number(q);
  return result === 0 ? 0 : result;
}
