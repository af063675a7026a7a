import { imagePoint, imageToStage, type ImageSize, type ViewTransform } from '../model/coordinates';
import { bounds, handles, type Geometry } from '../model/geometry';
import { PIN_MARKER_RADIUS_PX } from '../model/hit-test';
import type { Draft } from '../model/tools';
import { drawGeometry, drawMark } from './draw-marks';
import { withPoints, type Mark } from './marks';
import { DRAFT_COLOUR, HALO_DARK, HALO_LIGHT, haloStroke, traceOutline, type Pen } from './pen';

/**
 * Side of a resize handle, stage px. Handles are hollow: the start of an arrow and the corner of a rect are also
 * where the finding's numbered marker sits, and a hollow handle frames the number instead of hiding it.
 */
export const HANDLE_PX = 16;
/** Gap between a selected mark and its selection outline, stage px. */
const SELECTION_GAP_PX = 7;

/** What the top layer shows: a mark being drawn or dragged, a new mark awaiting its title, and the selection. */
export interface OverlayScene {
  /** The gesture in progress; with an `id` it stands in for that finding, which the findings layer then hides. */
  readonly draft?: Draft;
  /** The finding a draft with an `id` stands in for. */
  readonly dragging?: Mark;
  /** A new mark the page is asking a title for. */
  readonly pending?: Geometry;
  readonly selected?: Mark;
  /** Whether the selected finding may be changed, and so gets handles. */
  readonly editable: boolean;
}

/** A mark that is not a finding yet: dashed amber, its marker a "+". */
export function drawNewMark(pen: Pen, g: Geometry, view: ViewTransform, image: ImageSize): void {
  drawGeometry(
    pen,
    g,
    view,
    image,
    { shape: 'circle', fill: DRAFT_COLOUR, ink: '#000000', text: '+' },
    { strokeColour: DRAFT_COLOUR, halo: '#000000', dashed: true },
  );
}

function drawSelection(pen: Pen, g: Geometry, view: ViewTransform, image: ImageSize, editable: boolean): void {
  if (g.shape === 'pin') {
    const [p] = g.points;
    if (!p) return;
    const at = imageToStage(p, view, image);
    traceOutline(pen, { kind: 'circle', r: PIN_MARKER_RADIUS_PX + SELECTION_GAP_PX + 3 }, at.x, at.y);
  } else {
    const b = bounds(g, image);
    const min = imageToStage(imagePoint(b.minX, b.minY), view, image);
    const max = imageToStage(imagePoint(b.maxX, b.maxY), view, image);
    pen.beginPath();
    pen.rect(
      min.x - SELECTION_GAP_PX,
      min.y - SELECTION_GAP_PX,
      max.x - min.x + 2 * SELECTION_GAP_PX,
      max.y - min.y + 2 * SELECTION_GAP_PX,
    );
  }
  haloStroke(pen, DRAFT_COLOUR, 2, '#000000', true);
  if (!editable) return;
  for (const { point } of handles(g)) {
    const at = imageToStage(point, view, image);
    pen.beginPath();
    pen.rect(at.x - HANDLE_PX / 2, at.y - HANDLE_PX / 2, HANDLE_PX, HANDLE_PX);
    pen.lineJoin = 'miter';
    pen.strokeStyle = HALO_DARK;
    pen.lineWidth = 4.5;
    pen.stroke();
    pen.strokeStyle = HALO_LIGHT;
    pen.lineWidth = 2;
    pen.stroke();
  }
}

export function drawOverlay(pen: Pen, scene: OverlayScene, view: ViewTransform, image: ImageSize): void {
  const { draft, dragging, pending, selected, editable } = scene;
  if (pending) drawNewMark(pen, pending, view, image);
  // A finding under a drag follows the pointer; when it is the selected one, so do its outline and handles.
  const dragged = draft && dragging && draft.id === dragging.id ? withPoints(dragging, draft.points) : undefined;
  if (dragged) drawMark(pen, dragged, view, image);
  else if (draft && draft.id === undefined) drawNewMark(pen, draft, view, image);
  const shown = dragged && dragged.id === selected?.id ? dragged : selected;
  if (shown) drawSelection(pen, shown, view, image, editable);
}
