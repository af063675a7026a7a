/**
 * Resistor colour bands from a value, after the IEC 60062 colour code:
 * two significant digits, a multiplier (power of ten) and a tolerance band.
 */

export type BandColour =
  | 'silver' | 'gold' | 'black' | 'brown' | 'red' | 'orange'
  | 'yellow' | 'green' | 'blue' | 'violet' | 'grey' | 'white';

const DIGITS: readonly BandColour[] = [
  'black', 'brown', 'red', 'orange', 'yellow', 'green', 'blue', 'violet', 'grey', 'white',
];

/** Multiplier colour by power of ten: gold is 10^-1, silver 10^-2. */
function multiplierColour(exponent: number): BandColour {
  if (exponent === -1) return 'gold';
  if (exponent === -2) return 'silver';
  const colour = DIGITS[exponent];
  if (colour === undefined) throw new RangeError(`no multiplier band for 10^${exponent}`);
  return colour;
}

/** Tolerance in per cent → band; ±20 % has no band at all. */
const TOLERANCE: Record<1 | 2 | 5 | 10, BandColour> = { 1: 'brown', 2: 'red', 5: 'gold', 10: 'silver' };
export type Tolerance = keyof typeof TOLERANCE | 20;

/**
 * Bands for a value in ohms, first band first. Only values with two significant
 * digits can be written in four bands; anything else is refused.
 */
export function resistorBands(ohms: number, tolerance: Tolerance = 5): BandColour[] {
  if (!(ohms > 0) || !Number.isFinite(ohms)) throw new RangeError(`not a resistance: ${ohms}`);
  const exponent = Math.floor(Math.log10(ohms) + 1e-9) - 1;
  const significand = Math.round(ohms / 10 ** exponent);
  if (Math.abs(significand * 10 ** exponent - ohms) > ohms * 1e-9 || significand < 10 || significand > 99) {
    throw new RangeError(`${ohms} Ω needs more than two significant digits`);
  }
  const first = DIGITS[Math.floor(significand / 10)];
  const second = DIGITS[significand % 10];
  if (first === undefined || second === undefined) throw new RangeError(`bad digits for ${ohms} Ω`);
  const bands: BandColour[] = [first, second, multiplierColour(exponent)];
  if (tolerance !== 20) bands.push(TOLERANCE[tolerance]);
  return bands;
}

/** Paint colours as they look on a 1950s carbon resistor under a warm bench lamp. */
export const BAND_PAINT: Record<BandColour, string> = {
  black: '#1b1a18',
  brown: '#6a3518',
  red: '#c2271c',
  orange: '#e86c14',
  yellow: '#f2c81c',
  green: '#23893a',
  blue: '#2356b4',
  violet: '#7d3c9e',
  grey: '#8e8e8a',
  white: '#f4f2ea',
  gold: '#c9a03c',
  silver: '#c4c6c8',
};

/** How the service sheet writes a value: 150 Ω, 2k2, 47k, 1M. */
export function formatOhms(ohms: number): string {
  const scale = (v: number, unit: string): string => {
    const s = String(Math.round(v * 100) / 100);
    return s.includes('.') ? s.replace('.', unit) : `${s}${unit}`;
  };
  if (ohms >= 1e6) return scale(ohms / 1e6, 'M');
  if (ohms >= 1e3) return scale(ohms / 1e3, 'k');
  return `${ohms} Ω`;
}
