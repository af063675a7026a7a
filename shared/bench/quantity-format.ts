import { requireFinite, scaleByPowerOfTen } from './bench-input-error';
import type { QuantityUnit } from './quantity-parse';

const PREFIXES: ReadonlyArray<readonly [number, string]> = [
  [-12, 'p'],
  [-9, 'n'],
  [-6, 'µ'],
  [-3, 'm'],
  [0, ''],
  [3, 'k'],
  [6, 'M'],
  [9, 'G'],
];

/**
 * Writes a value in SI base units (Ω, F, V, A, Hz, W, s, J) for display with an SI prefix,
 * e.g. 4700 Ω → "4.7 kΩ", 4.7e-5 F → "47 µF"; `significant` figures (default 3), trailing zeros dropped.
 */
export function formatQuantity(value: number, unit: QuantityUnit, significant = 3): string {
  requireFinite(value, 'value to display');
  const suffix = (prefix: string) => (prefix + unit === '' ? '' : ` ${prefix}${unit}`);
  if (value === 0) return `0${suffix('')}`;
  const decade = Math.floor(Math.log10(Math.abs(value)) / 3) * 3;
  let exponent = Math.min(9, Math.max(-12, decade));
  let mantissa = Number(scaleByPowerOfTen(value, -exponent).toPrecision(significant));
  // Rounding can carry into the next prefix: 999.7 Ω at three figures is 1 kΩ, not 1000 Ω.
  if (Math.abs(mantissa) >= 1000 && exponent < 9) {
    exponent += 3;
    mantissa = Number(scaleByPowerOfTen(value, -exponent).toPrecision(significant));
  }
  const prefix = PREFIXES.find(([e]) => e === exponent)?.[1] ?? '';
  return `${String(mantissa)}${suffix(prefix)}`;
}
