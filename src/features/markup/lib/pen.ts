import type { Outline } from './marker-outline';

/** The part of a canvas 2D context the drawing helpers use; a recording fake stands in for it in tests. */
export type Pen = Pick<
  CanvasRenderingContext2D,
  | 'beginPath'
  | 'moveTo'
  | 'lineTo'
  | 'arc'
  | 'rect'
  | 'closePath'
  | 'fill'
  | 'stroke'
  | 'fillText'
  | 'save'
  | 'restore'
  | 'setLineDash'
  | 'fillStyle'
  | 'strokeStyle'
  | 'lineWidth'
  | 'font'
  | 'textAlign'
  | 'textBaseline'
  | 'lineJoin'
  | 'lineCap'
>;

/** Marks are drawn over any photo: a dark rim outside a light one keeps them readable on black chassis and white paper alike. */
export const HALO_DARK = 'rgba(16, 12, 8, 0.75)';
export const HALO_LIGHT = '#ffffff';
/** The accent of a mark being drawn, and of the selection (the app's heater-glow amber). */
export const DRAFT_COLOUR = '#f2a03d';
/** Inside a hollow ring marker. */
export const PAPER = '#fffdf8';
export const LABEL_FONT_FAMILY = '"Atkinson Hyperlegible Next Variable", system-ui, sans-serif';

export function traceOutline(pen: Pen, outline: Outline, cx: number, cy: number): void {
  pen.beginPath();
  if (outline.kind === 'circle') {
    pen.arc(cx, cy, outline.r, 0, Math.PI * 2);
  } else {
    outline.points.forEach(([x, y], i) => (i === 0 ? pen.moveTo(cx + x, cy + y) : pen.lineTo(cx + x, cy + y)));
  }
  pen.closePath();
}

/**
 * Stroke the current path twice: a rim in `halo`, then the colour (dashed when asked). Pass the colour's own
 * ink (the one of black or white that contrasts with it): a light line gets a dark rim and a dark line a light
 * one, so every line stands off dark chassis and pale paper alike, at the cost of two strokes rather than three.
 */
export function haloStroke(pen: Pen, colour: string, width: number, halo: string, dashed = false): void {
  pen.lineJoin = 'round';
  pen.lineCap = 'round';
  pen.setLineDash([]);
  pen.strokeStyle = halo === '#000000' ? HALO_DARK : HALO_LIGHT;
  pen.lineWidth = width + 3;
  pen.stroke();
  if (dashed) pen.setLineDash([8, 6]);
  pen.strokeStyle = colour;
  pen.lineWidth = width;
  pen.stroke();
  if (dashed) pen.setLineDash([]);
}
