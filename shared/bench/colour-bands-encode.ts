import { BenchInputError, scaleByPowerOfTen } from './bench-input-error';
import { COLOUR_MEANINGS, NO_BAND_TOLERANCE, type ColourMeaning } from './colour-bands';

/** Tolerances a four-band code can carry, as fractions: brown ±1 %, red ±2 %, gold ±5 %, silver ±10 %, no band ±20 %. */
export type BandTolerance = 0.01 | 0.02 | 0.05 | 0.1 | 0.2;

function colourWith(key: keyof ColourMeaning, value: number, what: string): string {
  const found = Object.entries(COLOUR_MEANINGS).find(([, meaning]) => meaning[key] === value);
  if (found === undefined) throw new BenchInputError(`No colour stands for ${what}.`);
  return found[0];
}

/**
 * The colour bands for a value in ohms (IEC 60062, the same table colourBands reads): two digits, a multiplier and a
 * tolerance band, or three bands for ±20 %. Only values with two significant digits fit; anything else is refused.
 */
export function resistorBands(ohms: number, tolerance: BandTolerance = 0.05): string[] {
  if (typeof ohms !== 'number' || !Number.isFinite(ohms) || ohms <= 0)
    throw new BenchInputError(`Not a resistance: ${String(ohms)}.`);
  const exponent = Math.floor(Math.log10(ohms) + 1e-9) - 1;
  const significand = Math.round(scaleByPowerOfTen(ohms, -exponent));
  if (Math.abs(scaleByPowerOfTen(significand, exponent) - ohms) > ohms * 1e-9 || significand < 10 || significand > 99)
    throw new BenchInputError(`${ohms} Ω needs more than two significant digits for a four-band code.`);
  const bands = [
    colourWith('digit', Math.floor(significand / 10), `the digit ${Math.floor(significand / 10)}`),
    colourWith('digit', significand % 10, `the digit ${significand % 10}`),
    colourWith('multiplierExponent', exponent, `a multiplier of 10^${exponent}`),
  ];
  if (tolerance !== NO_BAND_TOLERANCE) bands.push(colourWith('tolerance', tolerance, `±${tolerance * 100} %`));
  return bands;
}
