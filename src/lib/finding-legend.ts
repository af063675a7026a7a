import { severityLabels, statusLabels, type Severity, type Status } from '../../shared/schemas/findings';

/**
 * Gridleak's marks: a finding's status is a colour AND a glyph (never colour alone), its severity is the marker's
 * shape. Colours come from the Okabe & Ito (2008) colour-universal design palette, which stays apart for the
 * common colour-vision deficiencies; which colour and glyph go with which status is Gridleak's own choice.
 */
export const okabeIto = {
  black: '#000000',
  orange: '#E69F00',
  skyBlue: '#56B4E9',
  bluishGreen: '#009E73',
  yellow: '#F0E442',
  blue: '#0072B2',
  vermillion: '#D55E00',
  reddishPurple: '#CC79A7',
} as const;

export interface StatusStyle {
  /** Fill of the marker, #RRGGBB. */
  readonly colour: string;
  /** Drawn on the marker and beside the status wherever it is named. */
  readonly glyph: string;
  readonly label: string;
  /** Black or white, whichever reads better on `colour` (WCAG contrast ratio). */
  readonly ink: string;
}

export type MarkerShape = 'triangle' | 'square' | 'diamond' | 'circle' | 'ring';

/**
 * Status → colour and glyph. The glyphs tell a story a restorer reads at a glance: a dot for something noted,
 * a question, an exclamation once the fault is proven, a tick when the part is replaced, a star once the repair
 * has passed its tests, a cross for a finding set aside. The hue moves from light (noted) through warm (fault)
 * to cool (fixed); dismissed is the one dark mark.
 */
const statusPalette: Record<Status, { colour: string; glyph: string }> = {
  observed: { colour: okabeIto.skyBlue, glyph: '•' },
  suspected: { colour: okabeIto.yellow, glyph: '?' },
  confirmed: { colour: okabeIto.vermillion, glyph: '!' },
  repaired: { colour: okabeIto.blue, glyph: '✓' },
  verified: { colour: okabeIto.bluishGreen, glyph: '★' },
  dismissed: { colour: okabeIto.black, glyph: '✕' },
};

/**
 * Statuses whose colours alone stay apart in greyscale: every pair differs in relative luminance by at least
 * `GREYSCALE_MARGIN`. Confirmed (vermillion) sits too near repaired and verified in luminance, so it is told
 * apart by its glyph — and by hue, vermillion against blue and bluish green being a pair the palette keeps apart.
 */
export const GREYSCALE_DISTINCT_STATUSES: readonly Status[] = [
  'observed',
  'suspected',
  'repaired',
  'verified',
  'dismissed',
];
/** Minimum difference in relative luminance (0..1) claimed for the statuses above. */
export const GREYSCALE_MARGIN = 0.1;

/**
 * Severity → marker shape: the warning triangle for a hazard, a solid block for a fault, the block tipped on its
 * corner for wear, a soft round for cosmetic, and a hollow ring for a note of information.
 */
const severityShapes: Record<Severity, MarkerShape> = {
  hazard: 'triangle',
  fault: 'square',
  wear: 'diamond',
  cosmetic: 'circle',
  info: 'ring',
};

/** Relative luminance (0 black … 1 white) of an sRGB colour given as #RGB or #RRGGBB, per WCAG 2.x. */
export function relativeLuminance(hex: string): number {
  const match = /^#?([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(hex.trim());
  if (!match?.[1]) throw new Error(`Not a #RRGGBB colour: ${hex}`);
  const digits = match[1].length === 3 ? [...match[1]].map((d) => d + d).join('') : match[1];
  const [r, g, b] = [0, 2, 4].map((i) => {
    const channel = parseInt(digits.slice(i, i + 2), 16) / 255;
    // WCAG 2.0 printed 0.03928 here and later versions 0.04045; no 8-bit channel value lies between the two.
    return channel <= 0.04045 ? channel / 12.92 : ((channel + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** WCAG contrast ratio between two colours, 1 (none) … 21 (black on white). */
export function contrastRatio(a: string, b: string): number {
  const [light, dark] = [relativeLuminance(a), relativeLuminance(b)].sort((x, y) => y - x) as [number, number];
  return (light + 0.05) / (dark + 0.05);
}

const inkOn = (colour: string): string =>
  contrastRatio(colour, '#000000') >= contrastRatio(colour, '#FFFFFF') ? '#000000' : '#FFFFFF';

export function statusStyle(status: Status): StatusStyle {
  const { colour, glyph } = statusPalette[status];
  return { colour, glyph, label: statusLabels[status], ink: inkOn(colour) };
}

export function severityMarker(severity: Severity): { readonly shape: MarkerShape; readonly label: string } {
  return { shape: severityShapes[severity], label: severityLabels[severity] };
}
