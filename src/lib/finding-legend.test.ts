import { describe, expect, it } from 'vitest';
import { severities, statuses } from '../../shared/schemas/findings';
import {
  contrastRatio,
  GREYSCALE_DISTINCT_STATUSES,
  GREYSCALE_MARGIN,
  okabeIto,
  relativeLuminance,
  severityMarker,
  statusStyle,
} from './finding-legend';

const pairs = <T>(list: readonly T[]): [T, T][] => list.flatMap((a, i) => list.slice(i + 1).map((b): [T, T] => [a, b]));

describe('relativeLuminance', () => {
  // WCAG 2.x relative luminance definition: L = 0.2126 R + 0.7152 G + 0.0722 B on linearised sRGB channels.
  it('when the colour is white, black or mid grey, then the luminance is 1, 0 and 0.2158605', () => {
    expect(relativeLuminance('#FFFFFF')).toBeCloseTo(1, 12);
    expect(relativeLuminance('#000000')).toBe(0);
    // 128/255 = 0.50196 → ((0.50196 + 0.055) / 1.055)^2.4 = 0.2158605.
    expect(relativeLuminance('#808080')).toBeCloseTo(0.2158605, 6);
  });

  it('when the colour is pure red, green or blue, then the luminance is its coefficient', () => {
    expect(relativeLuminance('#ff0000')).toBeCloseTo(0.2126, 12);
    expect(relativeLuminance('#00FF00')).toBeCloseTo(0.7152, 12);
    expect(relativeLuminance('#00f')).toBeCloseTo(0.0722, 12);
  });

  it('when the text is not a hex colour, then it is refused', () => {
    expect(() => relativeLuminance('orange')).toThrow(/colour/);
  });
});

describe('statusStyle', () => {
  const styles = statuses.map((s) => [s, statusStyle(s)] as const);

  it('when every status is drawn, then each has its own glyph, so any pair is told apart without colour', () => {
    const glyphs = styles.map(([, s]) => s.glyph);
    expect(new Set(glyphs).size).toBe(statuses.length);
    expect(glyphs.every((g) => g.trim().length > 0)).toBe(true);
  });

  it('when every status is drawn, then each has its own colour from the Okabe–Ito palette', () => {
    // Okabe & Ito (2008) colour-universal design palette.
    const palette: string[] = Object.values(okabeIto);
    const colours = styles.map(([, s]) => s.colour);
    expect(new Set(colours).size).toBe(statuses.length);
    for (const colour of colours) expect(palette).toContain(colour);
  });

  it('when statuses are claimed apart in greyscale, then their luminances differ pairwise by at least 0.10', () => {
    // WCAG 2.x relative luminance definition; Okabe & Ito (2008) colour-universal design palette.
    expect(GREYSCALE_MARGIN).toBe(0.1);
    for (const [a, b] of pairs(GREYSCALE_DISTINCT_STATUSES)) {
      const difference = Math.abs(relativeLuminance(statusStyle(a).colour) - relativeLuminance(statusStyle(b).colour));
      expect(difference, `${a} vs ${b}`).toBeGreaterThanOrEqual(GREYSCALE_MARGIN);
    }
  });

  it('when any two statuses are compared, then they differ in greyscale by the margin or else by glyph', () => {
    for (const [a, b] of pairs(statuses)) {
      const [sa, sb] = [statusStyle(a), statusStyle(b)];
      const greyApart = Math.abs(relativeLuminance(sa.colour) - relativeLuminance(sb.colour)) >= GREYSCALE_MARGIN;
      expect(greyApart || sa.glyph !== sb.glyph, `${a} vs ${b}`).toBe(true);
    }
  });

  it('when a glyph is drawn on its status colour, then the ink reaches a 4.5:1 WCAG contrast ratio', () => {
    for (const [status, style] of styles)
      expect(contrastRatio(style.ink, style.colour), status).toBeGreaterThanOrEqual(4.5);
  });

  it('when a status is shown, then its label is the product’s word for it', () => {
    expect(statusStyle('dismissed').label).toBe('Dismissed');
  });
});

describe('severityMarker', () => {
  it('when every severity is drawn, then each has its own marker shape and label', () => {
    const markers = severities.map((s) => severityMarker(s));
    expect(new Set(markers.map((m) => m.shape)).size).toBe(severities.length);
    expect(severityMarker('hazard')).toEqual({ shape: 'triangle', label: 'Hazard' });
  });
});
