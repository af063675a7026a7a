import { BenchInputError, scaleByPowerOfTen } from './bench-input-error';

/** A decoded resistor: value in ohms, tolerance as a fraction (0.05 = ±5 %), temperature coefficient in ppm/K. */
export interface ColourBandReading {
  ohms: number;
  tolerance: number;
  tempcoPpm?: number;
}

export interface ColourMeaning {
  digit?: number;
  multiplierExponent?: number;
  tolerance?: number;
  tempcoPpm?: number;
}

// IEC 60062:2016 meanings. Orange/yellow/grey tolerances and pink differ in older charts;
// they never occur on valve-era parts, so the current edition is followed.
export const COLOUR_MEANINGS: Readonly<Record<string, ColourMeaning>> = {
  black: { digit: 0, multiplierExponent: 0, tempcoPpm: 250 },
  brown: { digit: 1, multiplierExponent: 1, tolerance: 0.01, tempcoPpm: 100 },
  red: { digit: 2, multiplierExponent: 2, tolerance: 0.02, tempcoPpm: 50 },
  orange: { digit: 3, multiplierExponent: 3, tolerance: 0.0005, tempcoPpm: 15 },
  yellow: { digit: 4, multiplierExponent: 4, tolerance: 0.0002, tempcoPpm: 25 },
  green: { digit: 5, multiplierExponent: 5, tolerance: 0.005, tempcoPpm: 20 },
  blue: { digit: 6, multiplierExponent: 6, tolerance: 0.0025, tempcoPpm: 10 },
  violet: { digit: 7, multiplierExponent: 7, tolerance: 0.001, tempcoPpm: 5 },
  grey: { digit: 8, multiplierExponent: 8, tolerance: 0.0001, tempcoPpm: 1 },
  white: { digit: 9, multiplierExponent: 9 },
  gold: { multiplierExponent: -1, tolerance: 0.05 },
  silver: { multiplierExponent: -2, tolerance: 0.1 },
  pink: { multiplierExponent: -3 },
};

const ALIASES: Record<string, string> = { gray: 'grey', purple: 'violet' };

/** Tolerance of a part with no tolerance band (three-band code): ±20 %. */
export const NO_BAND_TOLERANCE = 0.2;

type Role = 'digit' | 'multiplier' | 'tolerance' | 'temperature coefficient';

const LAYOUTS: Record<number, readonly Role[]> = {
  3: ['digit', 'digit', 'multiplier'],
  4: ['digit', 'digit', 'multiplier', 'tolerance'],
  5: ['digit', 'digit', 'digit', 'multiplier', 'tolerance'],
  6: ['digit', 'digit', 'digit', 'multiplier', 'tolerance', 'temperature coefficient'],
};

function meaningOf(colour: unknown, band: number): [string, ColourMeaning] {
  const word = typeof colour === 'string' ? colour.trim().toLowerCase() : '';
  const name = ALIASES[word] ?? word;
  const meaning = COLOUR_MEANINGS[name];
  if (meaning === undefined) {
    throw new BenchInputError(
      `'${String(colour)}' (band ${band}) is not a colour of the resistor code; use ${Object.keys(COLOUR_MEANINGS).join(', ')}.`,
    );
  }
  return [name, meaning];
}

function refuse(name: string, band: number, role: Role): never {
  const hint =
    band === 1 && (name === 'gold' || name === 'silver')
      ? ' Gold or silver at one end is the tolerance band: read the resistor from the other end.'
      : '';
  throw new BenchInputError(`Band ${band} is ${name}, which has no meaning as a ${role} band.${hint}`);
}

/**
 * Decodes resistor colour bands (3, 4, 5 or 6, read from the end away from the tolerance band)
 * per IEC 60062 into ohms, tolerance as a fraction and, for six bands, the tempco in ppm/K.
 */
export function colourBands(colours: string[]): ColourBandReading {
  const layout = Array.isArray(colours) ? LAYOUTS[colours.length] : undefined;
  if (layout === undefined) {
    const count = Array.isArray(colours) ? colours.length : 0;
    throw new BenchInputError(`A resistor colour code has 3, 4, 5 or 6 bands; got ${count}.`);
  }
  let digits = '';
  let exponent = 0;
  let tolerance = NO_BAND_TOLERANCE;
  let tempcoPpm: number | undefined;
  layout.forEach((role, index) => {
    const band = index + 1;
    const [name, meaning] = meaningOf(colours[index], band);
    if (role === 'digit') {
      if (meaning.digit === undefined) refuse(name, band, role);
      digits += String(meaning.digit);
    } else if (role === 'multiplier') {
      if (meaning.multiplierExponent === undefined) refuse(name, band, role);
      exponent = meaning.multiplierExponent;
    } else if (role === 'tolerance') {
      if (meaning.tolerance === undefined) refuse(name, band, role);
      tolerance = meaning.tolerance;
    } else {
      if (meaning.tempcoPpm === undefined) refuse(name, band, role);
      tempcoPpm = meaning.tempcoPpm;
    }
  });
  const ohms = scaleByPowerOfTen(digits, exponent);
  return tempcoPpm === undefined ? { ohms, tolerance } : { ohms, tolerance, tempcoPpm };
}
