import { BenchInputError } from './bench-input-error';
import { parseQuantity, type ParseQuantityOptions, type QuantityUnit } from './quantity-parse';

/** A meter reading as typed: a value, or "over range" (the meter's display overflowed) with the bound written, if any. */
export interface MeterReading {
  /** The value in SI units; for an over-range reading, the bound written ("> 200 M" → 200 MΩ), or null for a bare "OL". */
  value: number | null;
  unit: QuantityUnit;
  /** The meter showed more than its range could hold ("OL", "O.L.", "over range", "> 200 M"). */
  overRange: boolean;
}

const OVER_RANGE = /^(?:O\.?L\.?|over\s*range|overrange|∞)$/i;
const ABOVE = /^(?:>|over\s+|above\s+)\s*(.+)$/i;

/** True when the text is an over-range reading ("OL", "O.L.", "over range", "∞", "> 200 M"). */
export function isOverRange(text: string): boolean {
  const trimmed = typeof text === 'string' ? text.trim() : '';
  return OVER_RANGE.test(trimmed) || ABOVE.test(trimmed);
}

/**
 * Reads what a meter showed: a value as parseQuantity reads it, or an over-range display. "OL" (or "O.L.",
 * "over range", "∞") is over range with no bound; "> 200 M" is over range above 200 MΩ (the top of the range used).
 */
export function parseReading(text: string, options: ParseQuantityOptions = {}): MeterReading {
  const trimmed = typeof text === 'string' ? text.trim() : '';
  if (OVER_RANGE.test(trimmed)) return { value: null, unit: options.expectUnit ?? '', overRange: true };
  const above = ABOVE.exec(trimmed);
  if (above !== null) {
    const bound = parseQuantity(above[1] ?? '', options);
    if (bound.value <= 0) throw new BenchInputError(`'${trimmed}': an over-range bound must be above zero.`);
    return { value: bound.value, unit: bound.unit, overRange: true };
  }
  const q = parseQuantity(trimmed, options);
  return { value: q.value, unit: q.unit, overRange: false };
}
