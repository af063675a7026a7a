// The drawing's own paint for each band colour; what the colours mean is the bench library's (shared/bench/colour-bands.ts).
/** Paint colours as they look on a 1950s carbon resistor under a warm bench lamp. */
export const BAND_PAINT: Readonly<Record<string, string>> = {
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
