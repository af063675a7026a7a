import type { Shape } from '../../../../shared/schemas/findings';
import { imagePoint, imageToStage, type ImageSize, type StagePoint, type StageSize, type ViewTransform } from '../model/coordinates';
import { anchor, bounds, circleRadius, type Geometry } from '../model/geometry';
import { PIN_MARKER_RADIUS_PX } from '../model/hit-test';
import { statusStyle } from '../model/legend';
import { drawMarker, findingLook, type MarkerLook } from './draw-marker';
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

/** Trace the stroke of a circle, rect, arrow or freehand mark (a pin has none) from its stage points. */
export function traceStroke(pen: Pen, shape: Shape, pts: readonly StagePoint[], radiusPx: number): void {
  const [a, b] = pts;
  if (!a) return;
  pen.beginPath();
  if (shape === 'circle') {
    pen.arc(a.x, a.y, radiusPx, 0, Math.PI * 2);
  } else if (shape === 'rect' && b) {
    pen.rect(a.x, a.y, b.x - a.x, b.y - a.y);
  } else if (shape === 'arrow' && b) {
    pen.moveTo(a.x, a.y);
    pen.lineTo(b.x, b.y);
    // The head at the second point, pointing away from the tail.
    const angle = Math.atan2(b.y - a.y, b.x - a.x);
    pen.moveTo(b.x - ARROW_HEAD_PX * Math.cos(angle - ARROW_HEAD_ANGLE), b.y - ARROW_HEAD_PX * Math.sin(angle - ARROW_HEAD_ANGLE));
    pen.lineTo(b.x, b.y);
    pen.lineTo(b.x - ARROW_HEAD_PX * Math.cos(angle + ARROW_HEAD_ANGLE), b.y - ARROW_HEAD_PX * Math.sin(angle + ARROW_HEAD_ANGLE));
  } else if (shape === 'freehand') {
    pts.forEach((p, i) => (i === 0 ? pen.moveTo(p.x, p.y) : pen.lineTo(p.x, p.y)));
  }
}

/** Draw a mark: a pin as its marker, any other shape as its stroke with a marker at `anchor()` as the label. */
export function drawGeometry(
  pen: Pen,
  g: Geometry,
  view: ViewTransform,
  image: ImageSize,
  look: MarkerLook,
  options: { strokeColour: string; dashed?: boolean },
): void {
  const pts = g.points.map((p) => imageToStage(p, view, image));
  if (g.shape === 'pin') {
    const [p] = pts;
    if (p) drawMarker(pen, p.x, p.y, PIN_MARKER_RADIUS_PX, look);
    return;
  }
  traceStroke(pen, g.shape, pts, g.shape === 'circle' ? circleRadius(g, image) * view.scale : 0);
  haloStroke(pen, options.strokeColour, STROKE_PX, options.dashed);
  const at = imageToStage(anchor(g), view, image);
  drawMarker(pen, at.x, at.y, LABEL_RADIUS_PX, look);
}

/** A finding in its status colour, numbered, with its severity marker. */
export function drawMark(pen: Pen, mark: Mark, view: ViewTransform, image: ImageSize, dashed = false): void {
  drawGeometry(pen, mark, view, image, findingLook(mark.number, mark.status, mark.severity), { strokeColour: statusStyle(mark.status).colour, dashed });
}

/** Whether any part of the mark (or its marker) can show on a stage of this size. */
export function onStage(g: Geometry, view: ViewTransform, image: ImageSize, stage: StageSize, margin = CULL_MARGIN_PX): boolean {
  const b = bounds(g, image);
  const min = imageToStage(imagePoint(b.minX, b.minY), view, image);
  const max = imageToStage(imagePoint(b.maxX, b.maxY), view, image);
  return max.x >= -margin && max.y >= -margin && min.x <= stage.width + margin && min.y <= stage.height + margin;
}

/**
 * Every finding, in list order (later ones on top, as hit-testing expects), skipping those off the stage and the
 * one being dragged (`hiddenId`), which the overlay draws instead. Returns how many were drawn.
 */
export function drawMarks(
  pen: Pen,
  marks: readonly Mark[],
  view: ViewTransform,
  image: ImageSize,
  stage: StageSize,
  hiddenId?: number,
): number {
  let drawn = 0;
  for (const mark of marks) {
    if (mark.id === hiddenId || !onStage(mark, view, image, stage)) continue;
    drawMark(pen, mark, view, image);
    drawn++;
  }
  return drawn;
}
