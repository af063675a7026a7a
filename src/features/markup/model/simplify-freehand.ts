import type { ImagePoint, ImageSize } from './coordinates';

/** The finding contract's ceiling on a freehand stroke. */
export const MAX_FREEHAND_POINTS = 2000;

/** Distance in image px from `p` to the segment a–b (to `a` itself when the segment has no length). */
function distanceToSegmentPx(p: ImagePoint, a: ImagePoint, b: ImagePoint, image: ImageSize): number {
  const px = p.x * image.width,
    py = p.y * image.height;
  const ax = a.x * image.width,
    ay = a.y * image.height;
  const dx = b.x * image.width - ax,
    dy = b.y * image.height - ay;
  const lengthSq = dx * dx + dy * dy;
  const t = lengthSq === 0 ? 0 : Math.min(1, Math.max(0, ((px - ax) * dx + (py - ay) * dy) / lengthSq));
  return Math.hypot(px - (ax + t * dx), py - (ay + t * dy));
}

/** A run of the stroke between two kept points, with its point farthest from the chord (-1 when none lies between). */
interface Span {
  readonly first: number;
  readonly last: number;
  readonly farthest: number;
  readonly distance: number;
}

function spanOf(points: readonly ImagePoint[], first: number, last: number, image: ImageSize): Span {
  const a = points[first];
  const b = points[last];
  let farthest = -1;
  let distance = -1;
  for (let i = first + 1; a && b && i < last; i++) {
    const p = points[i];
    const d = p ? distanceToSegmentPx(p, a, b, image) : 0;
    if (d > distance) {
      farthest = i;
      distance = d;
    }
  }
  return { first, last, farthest, distance };
}

/**
 * Simplify a freehand stroke by Ramer–Douglas–Peucker: drop the points lying within `tolerancePx` image px of
 * the chord between the points kept around them. Measured in image px, not normalised units, so a wide photo is
 * simplified the same across as down. The first and last points always stay.
 *
 * Spans are split worst-first rather than depth-first. That keeps exactly the classic result, and when a
 * scribble would still keep more points than the contract allows, stopping at the cap keeps the points that
 * matter most — one pass, where raising the tolerance and starting again would stall a long stroke.
 */
export function simplifyFreehand(points: readonly ImagePoint[], tolerancePx: number, image: ImageSize): ImagePoint[] {
  if (points.length <= 2) return [...points];
  const keep = new Uint8Array(points.length);
  keep[0] = 1;
  keep[points.length - 1] = 1;
  let kept = 2;
  const open: Span[] = [spanOf(points, 0, points.length - 1, image)];
  while (kept < MAX_FREEHAND_POINTS) {
    let worst = -1;
    let worstDistance = tolerancePx;
    open.forEach((s, i) => {
      if (s.distance > worstDistance) {
        worst = i;
        worstDistance = s.distance;
      }
    });
    const span = open[worst];
    if (!span) break;
    // Swap-remove: the order of open spans does not matter.
    open[worst] = open[open.length - 1] ?? span;
    open.pop();
    keep[span.farthest] = 1;
    kept++;
    open.push(spanOf(points, span.first, span.farthest, image), spanOf(points, span.farthest, span.last, image));
  }
  return points.filter((_, i) => keep[i] === 1);
}
