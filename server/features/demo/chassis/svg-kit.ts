/** Small helpers for writing SVG by hand: numbers, text, paths and a seeded random source. */

/** Picture size in pixels; both views share it (3:2). */
export const WIDTH = 2400;
export const HEIGHT = 1600;

/** A point in picture pixels. */
export type Pt = readonly [number, number];

/** Formats a coordinate with at most one decimal, so the SVG stays short and stable. */
export function f(v: number): string {
  return String(Math.round(v * 10) / 10);
}

export function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

export interface TextStyle {
  size: number;
  fill?: string;
  weight?: 'normal' | 'bold';
  anchor?: 'start' | 'middle' | 'end';
  /** Degrees, about the text's own anchor point. */
  rotate?: number;
  family?: 'sans' | 'condensed' | 'serif' | 'mono';
  italic?: boolean;
  opacity?: number;
  spacing?: number;
}

const FAMILIES: Record<NonNullable<TextStyle['family']>, string> = {
  sans: 'DejaVu Sans, sans-serif',
  condensed: 'DejaVu Sans Condensed, DejaVu Sans, sans-serif',
  serif: 'DejaVu Serif, serif',
  mono: 'DejaVu Sans Mono, monospace',
};

export function text(x: number, y: number, content: string, s: TextStyle): string {
  const attrs = [
    `x="${f(x)}" y="${f(y)}"`,
    `font-family="${FAMILIES[s.family ?? 'sans']}"`,
    `font-size="${f(s.size)}"`,
    `fill="${s.fill ?? '#222'}"`,
    `text-anchor="${s.anchor ?? 'middle'}"`,
  ];
  if (s.weight === 'bold') attrs.push('font-weight="bold"');
  if (s.italic) attrs.push('font-style="italic"');
  if (s.opacity !== undefined) attrs.push(`fill-opacity="${s.opacity}"`);
  if (s.spacing !== undefined) attrs.push(`letter-spacing="${s.spacing}"`);
  if (s.rotate) attrs.push(`transform="rotate(${f(s.rotate)} ${f(x)} ${f(y)})"`);
  return `<text ${attrs.join(' ')}>${esc(content)}</text>`;
}

/** A transform that places a part's local origin at (x, y), turned by `deg` degrees. */
export function place(x: number, y: number, deg = 0): string {
  return deg ? `translate(${f(x)} ${f(y)}) rotate(${f(deg)})` : `translate(${f(x)} ${f(y)})`;
}

/** A smooth path through the points (Catmull-Rom turned into cubic Béziers). */
export function smoothPath(points: readonly Pt[]): string {
  const first = points[0];
  if (!first) return '';
  let d = `M${f(first[0])} ${f(first[1])}`;
  for (let i = 0; i < points.length - 1; i++) {
    const p0 = points[Math.max(i - 1, 0)] ?? first;
    const p1 = points[i] ?? first;
    const p2 = points[i + 1] ?? p1;
    const p3 = points[Math.min(i + 2, points.length - 1)] ?? p2;
    const c1: Pt = [p1[0] + (p2[0] - p0[0]) / 6, p1[1] + (p2[1] - p0[1]) / 6];
    const c2: Pt = [p2[0] - (p3[0] - p1[0]) / 6, p2[1] - (p3[1] - p1[1]) / 6];
    d += ` C${f(c1[0])} ${f(c1[1])} ${f(c2[0])} ${f(c2[1])} ${f(p2[0])} ${f(p2[1])}`;
  }
  return d;
}

/** Mulberry32: a tiny seeded generator, so every render of a view is byte-identical. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function distance(a: Pt, b: Pt): number {
  return Math.hypot(b[0] - a[0], b[1] - a[1]);
}

/** Angle of the line a→b in degrees. */
export function angleOf(a: Pt, b: Pt): number {
  return (Math.atan2(b[1] - a[1], b[0] - a[0]) * 180) / Math.PI;
}

export function midpoint(a: Pt, b: Pt): Pt {
  return [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
}

export function svgDocument(defs: string, body: string): string {
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${HEIGHT}" viewBox="0 0 ${WIDTH} ${HEIGHT}">` +
    `<defs>${defs}</defs>${body}</svg>`
  );
}

/** Scales a #rrggbb colour towards black (k < 1) or white (k > 1). */
export function shade(hex: string, k: number): string {
  const n = parseInt(hex.slice(1), 16);
  const channel = (c: number): string => {
    const v = k <= 1 ? c * k : c + (255 - c) * (k - 1);
    return Math.max(0, Math.min(255, Math.round(v)))
      .toString(16)
      .padStart(2, '0');
  };
  return `#${channel((n >> 16) & 255)}${channel((n >> 8) & 255)}${channel(n & 255)}`;
}
