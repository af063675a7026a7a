import { imagePoint, imageToStage, type ImageSize, type StagePoint, type ViewTransform } from './coordinates';
import { bounds, circleRadius, handles, type Geometry, type Handle, type MarkupItem } from './geometry';

/**
 * Distances here are in stage px: a pointer is "near" a mark by the same number of screen pixels at every zoom,
 * which is what a finger or a mouse can manage. Marks are mapped to the stage with `imageToStage`.
 */

/** A pin's marker is drawn at this fixed screen radius, stage px, whatever the zoom. */
export const PIN_MARKER_RADIUS_PX = 14;
/** How near the pointer must come to a line, a rim or a handle, stage px. */
export const HIT_TOLERANCE_PX = 10;

/** What the select tool took hold of at pointer-down: a handle of the selected finding, or a finding's body. */
export type Grab =
  | { readonly kind: 'body'; readonly item: MarkupItem }
  | { readonly kind: 'handle'; readonly item: MarkupItem; readonly handle: Handle };

type Xy = { readonly x: number; readonly y: number };

function distanceToSegment(p: Xy, a: Xy, b: Xy): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const lengthSq = dx * dx + dy * dy;
  const t = lengthSq === 0 ? 0 : Math.min(1, Math.max(0, ((p.x - a.x) * dx + (p.y - a.y) * dy) / lengthSq));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

function nearPolyline(at: StagePoint, stagePoints: readonly StagePoint[], tolerancePx: number): boolean {
  for (let i = 1; i < stagePoints.length; i++) {
    const a = stagePoints[i - 1];
    const b = stagePoints[i];
    if (a && b && distanceToSegment(at, a, b) <= tolerancePx) return true;
  }
  return false;
}

/** Cheap rejection: outside the mark's stage box grown by how far a hit may reach. */
function outsideReach(g: Geometry, at: StagePoint, view: ViewTransform, image: ImageSize, reachPx: number): boolean {
  const b = bounds(g, image);
  const min = imageToStage(imagePoint(b.minX, b.minY), view, image);
  const max = imageToStage(imagePoint(b.maxX, b.maxY), view, image);
  return at.x < min.x - reachPx || at.x > max.x + reachPx || at.y < min.y - reachPx || at.y > max.y + reachPx;
}

/** Whether the stage point `at` is on or near the mark. */
export function hits(
  g: Geometry,
  at: StagePoint,
  view: ViewTransform,
  image: ImageSize,
  tolerancePx = HIT_TOLERANCE_PX,
): boolean {
  const reach = g.shape === 'pin' ? Math.max(PIN_MARKER_RADIUS_PX, tolerancePx) : tolerancePx;
  if (outsideReach(g, at, view, image, reach)) return false;
  const stagePoints = g.points.map((p) => imageToStage(p, view, image));
  const [first] = stagePoints;
  if (!first) return false;
  switch (g.shape) {
    case 'pin':
      return Math.hypot(at.x - first.x, at.y - first.y) <= reach;
    case 'circle': {
      // Inside the disc or within tolerance outside its rim; the radius is image px turned into stage px.
      const radius = circleRadius(g, image) * view.scale;
      return Math.hypot(at.x - first.x, at.y - first.y) <= radius + tolerancePx;
    }
    case 'rect':
      // Inside or near an edge is the box grown by the tolerance, which the pre-check above has just passed.
      return true;
    case 'arrow':
    case 'freehand':
      return nearPolyline(at, stagePoints, tolerancePx);
  }
}

/** The topmost finding under the pointer: the list is in drawing order, so the last hit wins. */
export function hitTest<T extends MarkupItem>(
  items: readonly T[],
  at: StagePoint,
  view: ViewTransform,
  image: ImageSize,
  tolerancePx = HIT_TOLERANCE_PX,
): T | null {
  for (let i = items.length - 1; i >= 0; i--) {
    const item = items[i];
    if (item && hits(item, at, view, image, tolerancePx)) return item;
  }
  return null;
}

/** The handle of `g` nearest the pointer within tolerance, if any. */
export function hitHandle(
  g: Geometry,
  at: StagePoint,
  view: ViewTransform,
  image: ImageSize,
  tolerancePx = HIT_TOLERANCE_PX,
): Handle | null {
  let best: Handle | null = null;
  let bestDistance = tolerancePx;
  for (const { handle, point } of handles(g)) {
    const p = imageToStage(point, view, image);
    const d = Math.hypot(at.x - p.x, at.y - p.y);
    if (d <= bestDistance) {
      best = handle;
      bestDistance = d;
    }
  }
  return best;
}

/** What a pointer-down takes hold of: the selected finding's handles come first, then the topmost finding. */
export function grabAt(
  items: readonly MarkupItem[],
  selectedId: number | null,
  at: StagePoint,
  view: ViewTransform,
  image: ImageSize,
  tolerancePx = HIT_TOLERANCE_PX,
): Grab | null {
  const selected = selectedId === null ? undefined : items.find((f) => f.id === selectedId);
  const handle = selected ? hitHandle(selected, at, view, image, tolerancePx) : null;
  if (selected && handle) return { kind: 'handle', item: selected, handle };
  const item = hitTest(items, at, view, image, tolerancePx);
  return item ? { kind: 'body', item } : null;
}
