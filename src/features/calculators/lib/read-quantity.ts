import { BenchInputError, formatQuantity, parseQuantity } from '../../../../shared/bench';
import type { QuantityUnit } from '../../../../shared/bench';

/** A unit a calculator field expects; a bare number typed there takes this unit. */
export type ExpectedUnit = Exclude<QuantityUnit, ''>;

/** What a field's text reads as: nothing yet (empty), a value in SI base units, or the reason it cannot be read. */
export interface QuantityReading {
  text: string;
  /** Value in SI base units (Ω, F, V, A, Hz, W, s, J); undefined while empty or unreadable. */
  value?: number;
  unit?: QuantityUnit;
  /** The value written back with an SI prefix, so the restorer sees how the text was read (15m is milli, not mega). */
  display?: string;
  error?: string;
}

/** The message to show for anything a calculation throws: the library's own words, or a plain fallback. */
export function messageOf(error: unknown): string {
  if (error instanceof BenchInputError) return error.message;
  return 'Gridleak could not work this out from the values entered.';
}

const quantityNames: Record<QuantityUnit, string> = {
  Ω: 'A resistance',
  F: 'A capacitance',
  V: 'This voltage',
  A: 'This current',
  Hz: 'A frequency',
  W: 'A power',
  s: 'A time',
  J: 'An energy',
  '': 'This value',
};

/**
 * Reads a field's text. A negative value is refused with a message unless `allowNegative` (a reading that can lie
 * below zero, such as a grid voltage): a resistance, a capacitance or a rating below zero does not exist.
 */
export function readQuantity(text: string, expectUnit?: ExpectedUnit, { allowNegative = false } = {}): QuantityReading {
  // An empty field is not yet an error: the result simply waits for it.
  if (text.trim() === '') return { text };
  try {
    const quantity = parseQuantity(text, expectUnit === undefined ? {} : { expectUnit });
    if (quantity.value < 0 && !allowNegative)
      return {
        text,
        error: `${quantityNames[quantity.unit] ?? 'This value'} cannot be negative here: enter it without the minus sign.`,
      };
    return {
      text,
      value: quantity.value,
      unit: quantity.unit,
      display: formatQuantity(quantity.value, quantity.unit, 6),
    };
  } catch (error) {
    return { text, error: messageOf(error) };
  }
}

/** True when any of the readings could not be read, so the result can point at the field rather than wait. */
export function anyInvalid(...readings: ReadonlyArray<{ error?: string | undefined }>): boolean {
  return readings.some((reading) => reading.error !== undefined);
}
