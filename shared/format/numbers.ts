import { formatQuantity } from '../bench/quantity-format';
import type { QuantityUnit } from '../bench/quantity-parse';
import { signOf, withSign } from './sign';

export { formatQuantity };

/** A plain number to `significant` figures, trailing zeros dropped, with a true minus: 11.30 → "11.3", -2 → "−2". */
export function formatNumber(value: number, significant = 3): string {
  return withSign(String(Number(value.toPrecision(significant))));
}

/** A quantity with a true minus: −12 V → "−12 V". */
export const formatSignedQuantity = (value: number, unit: QuantityUnit): string =>
  withSign(formatQuantity(value, unit));

/** A difference with its sign always shown: +15 V, −220 Ω; `zero` is the sign put before 0 ("" unless asked). */
export function formatDifference(value: number, unit: QuantityUnit, zero = ''): string {
  return `${signOf(value, zero)}${formatQuantity(Math.abs(value), unit)}`;
}

/** A fixed number of decimals with a sign: (12.34, 1) → "+12.3", (−0.5, 1) → "−0.5". */
export const formatSignedFixed = (value: number, decimals: number): string =>
  `${signOf(value)}${Math.abs(value).toFixed(decimals)}`;
