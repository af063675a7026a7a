/**
 * Thrown for any input the bench library cannot use. The message is meant to be
 * shown to the restorer as it stands, so it says what was wrong and what would do.
 */
export class BenchInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BenchInputError';
  }
}

/** Throws unless `value` is a finite number above zero; `what` names it in the message, e.g. "capacitance (F)". */
export function requirePositive(value: number, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw new BenchInputError(`The ${what} must be a number above zero; got ${String(value)}.`);
  }
  return value;
}

/** Throws unless `value` is a finite number of zero or more; `what` names it in the message. */
export function requireNonNegative(value: number, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
    throw new BenchInputError(`The ${what} must be zero or a positive number; got ${String(value)}.`);
  }
  return value;
}

/** Throws unless `value` is a finite number (any sign); `what` names it in the message. */
export function requireFinite(value: number, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new BenchInputError(`The ${what} must be a number; got ${String(value)}.`);
  }
  return value;
}

/** Scales a decimal text by a power of ten without binary rounding drift (4.7 × 10² is 470, not 470.00000000000006). */
export function scaleByPowerOfTen(decimal: string | number, exponent: number): number {
  const [mantissa = '', ownExponent = '0'] = String(decimal).toLowerCase().split('e');
  return Number(`${mantissa}e${Number(ownExponent) + exponent}`);
}
