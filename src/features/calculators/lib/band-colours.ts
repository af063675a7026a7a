import { colourBands, formatQuantity } from '../../../../shared/bench';
import { formatNumber, formatPercent } from '../../../lib/format';

export type BandCount = 3 | 4 | 5 | 6;
export type BandRole = 'digit' | 'multiplier' | 'tolerance' | 'tempco';

/** What each band stands for, read from the end away from the tolerance band (IEC 60062). */
export const BAND_LAYOUTS: Readonly<Record<BandCount, readonly BandRole[]>> = {
  3: ['digit', 'digit', 'multiplier'],
  4: ['digit', 'digit', 'multiplier', 'tolerance'],
  5: ['digit', 'digit', 'digit', 'multiplier', 'tolerance'],
  6: ['digit', 'digit', 'digit', 'multiplier', 'tolerance', 'tempco'],
};

export const BAND_COUNTS: readonly BandCount[] = [3, 4, 5, 6];

/** A starting set per band count: 4.7 kΩ in each, as a restorer meets it most. */
export const DEFAULT_BANDS: Readonly<Record<BandCount, readonly string[]>> = {
  3: ['yellow', 'violet', 'red'],
  4: ['yellow', 'violet', 'red', 'gold'],
  5: ['yellow', 'violet', 'black', 'brown', 'brown'],
  6: ['yellow', 'violet', 'black', 'brown', 'brown', 'brown'],
};

// Swatches are the one place raw colours belong: they picture the paint on the part, not the theme.
export const BAND_COLOURS: ReadonlyArray<{ name: string; swatch: string }> = [
  { name: 'black', swatch: '#1b1b1b' },
  { name: 'brown', swatch: '#7a4a24' },
  { name: 'red', swatch: '#d0312d' },
  { name: 'orange', swatch: '#f07f13' },
  { name: 'yellow', swatch: '#f5d31b' },
  { name: 'green', swatch: '#2e8b3e' },
  { name: 'blue', swatch: '#2560c4' },
  { name: 'violet', swatch: '#7d3fb3' },
  { name: 'grey', swatch: '#8c8c8c' },
  { name: 'white', swatch: '#f7f7f2' },
  { name: 'gold', swatch: '#c59b2b' },
  { name: 'silver', swatch: '#b9bec4' },
  { name: 'pink', swatch: '#f2a0b9' },
];

export const ROLE_NAMES: Readonly<Record<BandRole, string>> = {
  digit: 'digit',
  multiplier: 'multiplier',
  tolerance: 'tolerance',
  tempco: 'temperature coefficient',
};

function multiplierText(factor: number): string {
  return factor >= 1 ? `×${formatQuantity(factor, '')}` : `×${formatNumber(factor)}`;
}

// Each meaning is asked of the library itself with a known reference part around the colour,
// so the option labels can never disagree with the decoder.
const PROBES: Readonly<Record<BandRole, (colour: string) => string>> = {
  digit: (colour) => String(colourBands(['brown', colour, 'black']).ohms - 10),
  multiplier: (colour) => multiplierText(colourBands(['brown', 'black', colour]).ohms / 10),
  tolerance: (colour) => `±${formatPercent(colourBands(['brown', 'black', 'black', colour]).tolerance)}`,
  tempco: (colour) => `${colourBands(['brown', 'black', 'black', 'black', 'brown', colour]).tempcoPpm ?? ''} ppm/K`,
};

export interface BandOption {
  name: string;
  swatch: string;
  /** What the colour means in this band, e.g. "4", "×100", "±5 %", "100 ppm/K". */
  meaning: string;
}

function optionsFor(role: BandRole): BandOption[] {
  return BAND_COLOURS.flatMap(({ name, swatch }) => {
    try {
      return [{ name, swatch, meaning: PROBES[role](name) }];
    } catch {
      return []; // the colour has no meaning in this role
    }
  });
}

export const BAND_OPTIONS: Readonly<Record<BandRole, readonly BandOption[]>> = {
  digit: optionsFor('digit'),
  multiplier: optionsFor('multiplier'),
  tolerance: optionsFor('tolerance'),
  tempco: optionsFor('tempco'),
};

export function swatchOf(name: string): string {
  return BAND_COLOURS.find((colour) => colour.name === name)?.swatch ?? 'transparent';
}

export function capitalise(word: string): string {
  return word.charAt(0).toUpperCase() + word.slice(1);
}
