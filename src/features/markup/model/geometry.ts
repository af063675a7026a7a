import type { NormalisedPoint, Shape } from '../../../../shared/schemas/findings';
import { imagePoint, type ImageBounds, type ImagePoint, type ImageSize } from './coordinates';

export { simplifyFreehand } from './simplify-freehand';

/**
 * A finding's mark in normalised image coordinates. Points per shape (the finding contract): pin 1; circle the
 * centre then a point on the rim; rect two opposite corners; arrow its tail (start) then its head; freehand 2..2000.
 */
export interface Geometry {
  readonly shape: Shape;
  readonly points: readonly ImagePoint[];
}

/** A finding as the canvas model sees it: its id and its mark. */
export interface MarkupItem extends Geometry {
  readonly id: number;
}

/** A draggable point on a selected mark: the rim of a circle, a corner of a rect, an end of an arrow. */
export type Handle = 'rim' | 'top-left' | 'top-right' | 'bottom-left' | 'bottom-right' | 'start' | 'end';

/** Brand points from the API: the finding contract already guarantees they are normalised. */
export const toGeometry = (g: { readonly shape: Shape; readonly points: readonly NormalisedPoint[] }): Geometry => ({
  shape: g.shape,
  points: g.points.map((p) => imagePoint(p.x, p.y)),
});

export const toMarkupItem = (f: {
  readonly id: number;
  readonly shape: Shape;
  readonly points: readonly NormalisedPoint[];
}): MarkupItem => ({
  id: f.id,
  ...toGeometry(f),
});

const clamp01 = (v: number): number => Math.min(1, Math.max(0, v));

/** The pointer can leave the photo mid-drag; a stored point never does. */
export const clampToImage = (p: { readonly x: number; readonly y: number }): ImagePoint =>
  imagePoint(clamp01(p.x), clamp01(p.y));

/** The i-th point; a mark with too few points breaks the finding contract, so it fails loudly. */
function pointOf(g: Geometry, i: number): ImagePoint {
  const p = g.points[i];
  if (!p) throw new Error(`A ${g.shape} needs point ${i + 1}; it has ${g.points.length}`);
  return p;
}

function extent(points: readonly ImagePoint[]): ImageBounds {
  let minX = Infinity,
    minY = Infinity,
    maxX = -Infinity,
    maxY = -Infinity;
  for (const p of points) {
    if (p.x < minX) minX = p.x;
    if (p.x > maxX) maxX = p.x;
    if (p.y < minY) minY = p.y;
    if (p.y > maxY) maxY = p.y;
  }
  return { minX, minY, maxX, maxY };
}

/**
 * A circle's radius in image px. On a non-square photo the same normalised distance is a different number of
 * pixels across than down, so the centre-to-rim distance is measured after scaling each axis to pixels.
 */
export function circleRadius(g: Geometry, image: ImageSize): number {
  const centre = pointOf(g, 0);
  const rim = pointOf(g, 1);
  return Math.hypot((rim.x - centre.x) * image.width, (rim.y - centre.y) * image.height);
}

/** The box around the drawn mark, normalised. A circle's box is its disc (needs the image size); a pin's is its point. */
export function bounds(g: Geometry, image: ImageSize): ImageBounds {
  if (g.shape !== 'circle') return extent(g.points);
  const c = pointOf(g, 0);
  const r = circleRadius(g, image);
  return {
    minX: c.x - r / image.width,
    minY: c.y - r / image.height,
    maxX: c.x + r / image.width,
    maxY: c.y + r / image.height,
  };
}

/** Where the finding's number label sits. */
export function anchor(g: Geometry): ImagePoint {
  if (g.shape === 'rect') {
    const b = extent(g.points);
    return imagePoint(b.minX, b.minY);
  }
  // pin: its point; circle: its centre; arrow: its tail; freehand: where the stroke began.
  return pointOf(g, 0);
}

/** Move by `dx`, `dy` (normalised), stopping at the photo's edge so the mark keeps its shape rather than squashing. */
export function translate<G extends Geometry>(g: G, dx: number, dy: number): G {
  const b = extent(g.points);
  const cdx = Math.min(1 - b.maxX, Math.max(-b.minX, dx));
  const cdy = Math.min(1 - b.maxY, Math.max(-b.minY, dy));
  return { ...g, points: g.points.map((p) => imagePoint(p.x + cdx, p.y + cdy)) };
}

/** Two corners in the order top-left, bottom-right, whichever way the pointer was dragged. */
export function rectPoints(a: ImagePoint, b: ImagePoint): [ImagePoint, ImagePoint] {
  return [imagePoint(Math.min(a.x, b.x), Math.min(a.y, b.y)), imagePoint(Math.max(a.x, b.x), Math.max(a.y, b.y))];
}

/** The handles a selected mark offers, with where each sits. Pins and freehand strokes only move. */
export function handles(g: Geometry): { handle: Handle; point: ImagePoint }[] {
  switch (g.shape) {
    case 'circle':
      return [{ handle: 'rim', point: pointOf(g, 1) }];
    case 'arrow':
      return [
        { handle: 'start', point: pointOf(g, 0) },
        { handle: 'end', point: pointOf(g, 1) },
      ];
    case 'rect': {
      const b = extent(g.points);
      return [
        { handle: 'top-left', point: imagePoint(b.minX, b.minY) },
        { handle: 'top-right', point: imagePoint(b.maxX, b.minY) },
        { handle: 'bottom-left', point: imagePoint(b.minX, b.maxY) },
        { handle: 'bottom-right', point: imagePoint(b.maxX, b.maxY) },
      ];
    }
    default:
      return [];
  }
}

/**
 * Drag one handle to `to` (normalised, clamped to the photo). A rect corner dragged past the opposite one flips
 * the rect rather than inverting it. A handle the shape does not have leaves the mark as it was.
 */
export function resize<G extends Geometry>(g: G, handle: Handle, to: ImagePoint): G {
  const p = clampToImage(to);
  if (g.shape === 'circle' && handle === 'rim') return { ...g, points: [pointOf(g, 0), p] };
  if (g.shape === 'arrow' && (handle === 'start' || handle === 'end'))
    return { ...g, points: handle === 'start' ? [p, pointOf(g, 1)] : [pointOf(g, 0), p] };
  if (g.shape === 'rect') {
    const b = extent(g.points);
    // The corner opposite the handle stays put.
    const opposite: Partial<Record<Handle, ImagePoint>> = {
      'top-left': imagePoint(b.maxX, b.maxY),
      'top-right': imagePoint(b.minX, b.maxY),
      'bottom-left': imagePoint(b.maxX, b.minY),
      'bottom-right': imagePoint(b.minX, b.minY),
    };
    const fixed = opposite[handle];
    if (fixed) return { ...g, points: rectPoints(fixed, p) };
  }
  return g;
}
