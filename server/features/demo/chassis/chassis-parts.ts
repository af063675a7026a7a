import { f, place, text } from './svg-kit';
import type { Pt } from './svg-kit';

/** Outline of a shadow: a filled path, or a centre-line stroked `width` wide. */
export interface ShadowShape {
  d: string;
  width?: number;
}

/** A drawn part: its picture, and the silhouette its shadow is cut from. */
export interface Drawn {
  body: string;
  shadow: ShadowShape[];
  /** Tall parts throw a longer, softer shadow. */
  tall?: boolean;
}

export function combine(parts: readonly Drawn[]): { body: string; low: ShadowShape[]; tall: ShadowShape[] } {
  return {
    body: parts.map((p) => p.body).join(''),
    low: parts.filter((p) => !p.tall).flatMap((p) => p.shadow),
    tall: parts.filter((p) => p.tall).flatMap((p) => p.shadow),
  };
}

export function circleD(cx: number, cy: number, r: number): string {
  return `M${f(cx - r)} ${f(cy)} a${f(r)} ${f(r)} 0 1 0 ${f(2 * r)} 0 a${f(r)} ${f(r)} 0 1 0 ${f(-2 * r)} 0 Z`;
}

export function polyD(points: readonly Pt[]): string {
  return points.map(([x, y], i) => `${i ? 'L' : 'M'}${f(x)} ${f(y)}`).join(' ') + ' Z';
}

export function rectD(x: number, y: number, w: number, h: number): string {
  return polyD([
    [x, y],
    [x + w, y],
    [x + w, y + h],
    [x, y + h],
  ]);
}

/** A len × dia box centred on c, turned by `turn` degrees. */
export function turnedRectD(c: Pt, turn: number, len: number, dia: number): string {
  const a = (turn * Math.PI) / 180;
  const ux = Math.cos(a),
    uy = Math.sin(a);
  const corner = (s: number, t: number): Pt => [
    c[0] + (ux * s * len) / 2 - (uy * t * dia) / 2,
    c[1] + (uy * s * len) / 2 + (ux * t * dia) / 2,
  ];
  return polyD([corner(-1, -1), corner(1, -1), corner(1, 1), corner(-1, 1)]);
}

/** A slotted cheese-head screw seen end on. */
export function screwHead(x: number, y: number, r = 11, turn = 30): string {
  return (
    `<g transform="${place(x, y, turn)}"><circle r="${f(r)}" fill="url(#aluTop)" stroke="#4a4c4e" stroke-width="1.2"/>` +
    `<rect x="${f(-r * 0.85)}" y="-1.8" width="${f(r * 1.7)}" height="3.6" fill="#3b3d3f"/></g>`
  );
}

/** A hexagonal nut with its washer. */
export function nut(x: number, y: number, r = 14, turn = 10): string {
  const pts = Array.from({ length: 6 }, (_, i) => {
    const a = ((i * 60 + turn) * Math.PI) / 180;
    return `${f(Math.cos(a) * r)},${f(Math.sin(a) * r)}`;
  }).join(' ');
  return (
    `<g transform="${place(x, y)}"><circle r="${f(r * 1.35)}" fill="url(#aluTop)" stroke="#55585a" stroke-width="1"/>` +
    `<polygon points="${pts}" fill="url(#steel)" stroke="#3d3f41" stroke-width="1.5"/>` +
    `<circle r="${f(r * 0.45)}" fill="#6c6f70" stroke="#2f3132" stroke-width="1"/></g>`
  );
}

export function rivet(x: number, y: number, r = 5): string {
  return `<circle cx="${f(x)}" cy="${f(y)}" r="${f(r)}" fill="url(#aluTop)" stroke="#5a5d5f" stroke-width="0.8"/>`;
}

/** A black rubber grommet in a punched hole. */
export function grommet(x: number, y: number, r = 20): string {
  return (
    `<circle cx="${f(x)}" cy="${f(y)}" r="${f(r)}" fill="url(#blackDisc)"/>` +
    `<circle cx="${f(x)}" cy="${f(y)}" r="${f(r * 0.55)}" fill="#060606" stroke="#4a4a4a" stroke-width="1.2"/>`
  );
}

/** An empty punched hole, showing the bench through the chassis. */
export function hole(x: number, y: number, r: number): string {
  return (
    `<circle cx="${f(x)}" cy="${f(y)}" r="${f(r)}" fill="#1c140d" stroke="#e6e7e2" stroke-width="1.5" fill-opacity="0.95" stroke-opacity="0.95"/>` +
    `<path d="M${f(x - r)} ${f(y)} A${f(r)} ${f(r)} 0 0 1 ${f(x + r)} ${f(y)}" stroke="#3d3f3d" stroke-width="2" fill="none"/>`
  );
}

/** A blob of solder on a tag or pin; a fresh joint is bright and ringed with a little flux. */
export function solder(x: number, y: number, r = 7, fresh = false): string {
  if (fresh) {
    return (
      `<ellipse cx="${f(x + 1)}" cy="${f(y + 1)}" rx="${f(r * 1.9)}" ry="${f(r * 1.65)}" fill="#d39a3a" fill-opacity="0.45" stroke="#9a6418" stroke-opacity="0.35" stroke-width="1"/>` +
      `<ellipse cx="${f(x)}" cy="${f(y)}" rx="${f(r * 1.15)}" ry="${f(r)}" fill="url(#freshSolder)" stroke="#7d8387" stroke-width="0.9"/>` +
      `<ellipse cx="${f(x - r * 0.3)}" cy="${f(y - r * 0.35)}" rx="${f(r * 0.5)}" ry="${f(r * 0.34)}" fill="#fff"/>` +
      `<circle cx="${f(x + r * 0.4)}" cy="${f(y + r * 0.35)}" r="${f(r * 0.14)}" fill="#fff" fill-opacity="0.8"/>`
    );
  }
  return (
    `<ellipse cx="${f(x)}" cy="${f(y)}" rx="${f(r)}" ry="${f(r * 0.85)}" fill="url(#tinned)" stroke="#6d706b" stroke-width="0.8"/>` +
    `<circle cx="${f(x - r * 0.3)}" cy="${f(y - r * 0.35)}" r="${f(r * 0.3)}" fill="#fff" fill-opacity="0.75"/>`
  );
}

/** A restorer's pencil note on the chassis. */
export function pencil(x: number, y: number, note: string, turn = -4, size = 30): string {
  return text(x, y, note, { size, fill: '#3c3c44', opacity: 0.72, italic: true, rotate: turn, family: 'condensed' });
}

/** Letters stamped into the steel by the maker. */
export function stamp(x: number, y: number, note: string, size = 24, turn = 0): string {
  return (
    text(x + 1, y + 1.5, note, { size, fill: '#fff', opacity: 0.35, weight: 'bold', rotate: turn, spacing: 1 }) +
    text(x, y, note, { size, fill: '#2d2f30', opacity: 0.8, weight: 'bold', rotate: turn, spacing: 1 })
  );
}
