import type { Shape } from '../../../../shared/schemas/findings';
import {
  imagePoint,
  imageToStage,
  type ImageSize,
  type StagePoint,
  type StageSize,
  type ViewTransform,
} from '../model/coordinates';
import { anchor, bounds, circleRadius, type Geometry } from '../model/geometry';
import { PIN_MARKER_RADIUS_PX } from '../model/hit-test';
import { drawMarker, findingLook, styleOf, type MarkerLook } from './draw-marker';
import type { Mark } from './marks';
import { haloStroke, type Pen } from './pen';

/** Screen sizes, stage px, the same at every zoom. */
export const STROKE_PX = 3;
/** The number label on a circle, rect, arrow or freehand mark: a little smaller than a pin's marker. */
export const LABEL_RADIUS_PX = 12;
const ARROW_HEAD_PX = 16;
const ARROW_HEAD_ANGLE = (28 * Math.PI) / 180;
/** Marks this far off the stage are still drawn, so a marker half over the edge is not cut off. */
const CULL_MARGIN_PX = 40;

/** Add the stroke of a circle, rect, arrow or freehand mark (a pin has none) to the current path, from its stage points. */
export function addStroke(pen: Pen, shape: Shape, pts: readonly StagePoint[], radiusPx: number): void {
  const [a, b] = pts;
  if (!a) return;
  if (shape === 'circle') {
    pen.moveTo(a.x + radiusPx, a.y);
    pen.arc(a.x, a.y, radiusPx, 0, Math.PI * 2);
  } else if (shape === 'rect' && b) {
    pen.rect(a.x, a.y, b.x - a.x, b.y - a.y);
  } else if (shape === 'arrow' && b) {
    pen.moveTo(a.x, a.y);
    pen.lineTo(b.x, b.y);
    // The head at the second point, pointing away from the tail.
    const angle = Math.atan2(b.y - a.y, b.x - a.x);
    pen.moveTo(
      b.x - ARROW_HEAD_PX * Math.cos(angle - ARROW_HEAD_ANGLE),
      b.y - ARROW_HEAD_PX * Math.sin(angle - ARROW_HEAD_ANGLE),
    );
    pen.lineTo(b.x, b.y);
    pen.lineTo(
      b.x - ARROW_HEAD_PX * Math.cos(angle + ARROW_HEAD_ANGLE),
      b.y - ARROW_HEAD_PX * Math.sin(angle + ARROW_HEAD_ANGLE),
    );
  } else if (shape === 'freehand') {
    pts.forEach((p, i) => (i === 0 ? pen.moveTo(p.x, p.y) : pen.lineTo(p.x, p.y)));
  }
}

const stagePoints = (g: Geometry, view: ViewTransform, image: ImageSize) =>
  g.points.map((p) => imageToStage(p, view, image));
const radiusOf = (g: Geometry, view: ViewTransform, image: ImageSize) =>
  g.shape === 'circle' ? circleRadius(g, image) * view.scale : 0;

/** Paints a marker; the findings layer passes one that stamps cached bitmaps (`marker-sprites.ts`). */
export type MarkerPainter = (pen: Pen, x: number, y: number, r: number, look: MarkerLook) => void;

/** Where a mark's marker goes, and how big: a pin is its marker; other shapes carry a label marker at `anchor()`. */
const markerSpot = (g: Geometry, view: ViewTransform, image: ImageSize): { at: StagePoint; r: number } => ({
  at: imageToStage(anchor(g), view, image),
  r: g.shape === 'pin' ? PIN_MARKER_RADIUS_PX : LABEL_RADIUS_PX,
});

/** Draw one mark: a pin as its marker, any other shape as its stroke with a marker at `anchor()` as the label. */
export function drawGeometry(
  pen: Pen,
  g: Geometry,
  view: ViewTransform,
  image: ImageSize,
  look: MarkerLook,
  options: { strokeColour: string; halo: string; dashed?: boolean },
): void {
  if (g.shape !== 'pin') {
    pen.beginPath();
    addStroke(pen, g.shape, stagePoints(g, view, image), radiusOf(g, view, image));
    haloStroke(pen, options.strokeColour, STROKE_PX, options.halo, options.dashed);
  }
  const { at, r } = markerSpot(g, view, image);
  drawMarker(pen, at.x, at.y, r, look);
}

/** A finding in its status colour, numbered, with its severity marker. */
export function drawMark(pen: Pen, mark: Mark, view: ViewTransform, image: ImageSize, dashed = false): void {
  const style = styleOf(mark.status);
  drawGeometry(pen, mark, view, image, findingLook(mark.number, mark.status, mark.severity), {
    strokeColour: style.colour,
    halo: style.ink,
    dashed,
  });
}

/** Whether any part of the mark (or its marker) can show on a stage of this size. */
export function onStage(
  g: Geometry,
  view: ViewTransform,
  image: ImageSize,
  stage: StageSize,
  margin = CULL_MARGIN_PX,
): boolean {
  const b = bounds(g, image);
  const min = imageToStage(imagePoint(b.minX, b.minY), view, image);
  const max = imageToStage(imagePoint(b.maxX, b.maxY), view, image);
  return max.x >= -margin && max.y >= -margin && min.x <= stage.width + margin && min.y <= stage.height + margin;
}

/**
 * Every finding, skipping those off the stage and the one being dragged (`hiddenId`, which the overlay draws).
 * Strokes go first, each its own small path (a canvas strokes many small paths faster than one path of many
 * overlapping parts), then every marker on top in list order, so no line ever hides a number. Returns how many
 * marks were drawn.
 */
export function drawMarks(
  pen: Pen,
  marks: readonly Mark[],
  view: ViewTransform,
  image: ImageSize,
  stage: StageSize,
  hiddenId?: number,
  paintMarker: MarkerPainter = drawMarker,
): number {
  const shown = marks.filter((m) => m.id !== hiddenId && onStage(m, view, image, stage));
  for (const mark of shown) {
    if (mark.shape === 'pin') continue;
    const style = styleOf(mark.status);
    pen.beginPath();
    addStroke(pen, mark.shape, stagePoints(mark, view, image), radiusOf(mark, view, image));
    haloStroke(pen, style.colour, STROKE_PX, style.ink);
  }
  for (const mark of shown) {
    const { at, r } = markerSpot(mark, view, image);
    paintMarker(pen, at.x, at.y, r, findingLook(mark.number, mark.status, mark.severity));
  }
  return shown.length;
}
