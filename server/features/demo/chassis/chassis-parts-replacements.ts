import type { Drawn } from './chassis-parts';
import { CYL, axial, tube } from './chassis-parts-underside';
import { f, shade, text } from './svg-kit';
import type { Pt } from './svg-kit';

/** Modern parts a restorer fits in place of the old ones, drawn to sit in the same solder points. */

export interface FilmCapSpec {
  a: Pt;
  b: Pt;
  lift?: number;
  print: readonly [string, string];
  colour?: string;
  len?: number;
  dia?: number;
}

/** A tape-wrapped polyester film capacitor, its ends filled with resin, value printed in nF. */
export function filmCap(c: FilmCapSpec): Drawn {
  const len = c.len ?? 110;
  const dia = c.dia ?? 30;
  const tape = c.colour ?? '#efc81e';
  const draw = (l: number): string => {
    const resin = (x: number): string =>
      `<ellipse cx="${f(x)}" cy="0" rx="6" ry="${f(dia * 0.42)}" fill="${shade(tape, 0.62)}" stroke="${shade(tape, 0.4)}" stroke-width="1"/>`;
    return (
      resin(-l / 2 + 1) +
      resin(l / 2 - 1) +
      tube(l, dia, tape, dia * 0.38) +
      // The wrap's overlap seam and a crisp sheen along the top: nothing has aged it yet.
      `<path d="M${f(-l / 2 + 6)} ${f(dia * 0.3)} H${f(l / 2 - 6)}" stroke="${shade(tape, 0.82)}" stroke-width="1.2"/>` +
      `<rect x="${f(-l * 0.42)}" y="${f(-dia * 0.38)}" width="${f(l * 0.84)}" height="${f(dia * 0.13)}" rx="2" fill="#fff" fill-opacity="0.6"/>` +
      text(0, -1, c.print[0], { size: dia * 0.38, fill: '#1c1a14', family: 'condensed', weight: 'bold' }) +
      text(0, dia * 0.33, c.print[1], { size: dia * 0.28, fill: '#1c1a14', family: 'condensed' }) +
      CYL(l, dia, dia * 0.38)
    );
  };
  return axial(c.a, c.b, c.lift ?? 0, len, dia, draw, true);
}

export interface ModernElectrolyticSpec {
  a: Pt;
  b: Pt;
  lift?: number;
  lines: readonly [string, string];
  len: number;
  dia: number;
  sleeve?: string;
}

/**
 * A small modern axial electrolytic: shrink sleeve crimped over the aluminium
 * can, a rolled groove at the positive end and a stripe of arrows to the negative.
 */
export function modernElectrolytic(e: ModernElectrolyticSpec): Drawn {
  const sleeve = e.sleeve ?? '#1f2025';
  const draw = (l: number): string => {
    const d = e.dia;
    const arrows = Array.from({ length: 4 }, (_, i) => {
      const x = l * 0.3 - i * l * 0.16;
      return `<path d="M${f(x)} ${f(-d * 0.42)} l-7 4 l7 4 Z" fill="${sleeve}"/>`;
    }).join('');
    return (
      tube(l, d, '#d7dbdd', 6) +
      `<rect x="${f(-l / 2 + 4)}" y="${f(-d / 2)}" width="${f(l - 8)}" height="${f(d)}" rx="5" fill="${sleeve}"/>` +
      `<rect x="${f(-l / 2 + 6)}" y="${f(-d * 0.47)}" width="${f(l - 12)}" height="${f(d * 0.26)}" fill="#b9bec4"/>${arrows}` +
      `<rect x="${f(l / 2 - 16)}" y="${f(-d / 2)}" width="3" height="${f(d)}" fill="#000" fill-opacity="0.55"/>` +
      text(-l * 0.04, d * 0.14, e.lines[0], { size: d * 0.27, fill: '#e9ecef', weight: 'bold', family: 'condensed' }) +
      text(-l * 0.04, d * 0.42, e.lines[1], { size: d * 0.2, fill: '#c9ced3', family: 'condensed' }) +
      `<rect x="${f(-l * 0.4)}" y="${f(-d * 0.18)}" width="${f(l * 0.8)}" height="${f(d * 0.08)}" fill="#fff" fill-opacity="0.3"/>` +
      CYL(l, d, 6)
    );
  };
  return axial(e.a, e.b, e.lift ?? 0, e.len, e.dia, draw, true);
}
