import type { MarkerShape } from '../../../lib/finding-legend';

/**
 * The outline of a severity marker around its centre, in stage (or SVG) px, shared by the canvas and the
 * legend so both draw the same shapes. `r` is the marker's nominal radius: each shape is sized so it looks about
 * as big as a circle of that radius, and its number fits inside.
 */
export type Outline =
  | { readonly kind: 'circle'; readonly r: number }
  | { readonly kind: 'polygon'; readonly points: readonly (readonly [number, number])[] };

const polygon = (radius: number, degrees: readonly number[]): Outline => ({
  kind: 'polygon',
  points: degrees.map((d) => {
    const a = (d * Math.PI) / 180;
    // Rounded so the SVG paths and tests read cleanly; a hundredth of a pixel is below what a screen shows.
    return [Math.round(radius * Math.cos(a) * 100) / 100, Math.round(radius * Math.sin(a) * 100) / 100] as const;
  }),
});

export function markerOutline(shape: MarkerShape, r: number): Outline {
  switch (shape) {
    case 'triangle':
      // Point up; an equilateral triangle's incircle is half its circumradius, so it is drawn larger to hold a number.
      return polygon(r * 1.45, [-90, 30, 150]);
    case 'square':
      // Corners at ±45°: half a side is r·1.27·cos 45° ≈ 0.9 r.
      return polygon(r * 1.27, [-135, -45, 45, 135]);
    case 'diamond':
      return polygon(r * 1.25, [-90, 0, 90, 180]);
    case 'circle':
    case 'ring':
      return { kind: 'circle', r };
  }
}

/** Where the number sits below the centre, px: a triangle's mass is low, so its label drops a little. */
export const labelDrop = (shape: MarkerShape, r: number): number => (shape === 'triangle' ? r * 0.12 : 0);

/** A ring is hollow: its hole, as a share of the radius. */
export const RING_HOLE = 0.58;

/** The outline as an SVG path centred on `cx`, `cy`. */
export function outlinePath(outline: Outline, cx: number, cy: number): string {
  if (outline.kind === 'circle') {
    const { r } = outline;
    return `M ${cx - r} ${cy} A ${r} ${r} 0 1 0 ${cx + r} ${cy} A ${r} ${r} 0 1 0 ${cx - r} ${cy} Z`;
  }
  return `${outline.points.map(([x, y], i) => `${i === 0 ? 'M' : 'L'} ${cx + x} ${cy + y}`).join(' ')} Z`;
}
