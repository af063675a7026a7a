import { statuses, type Severity, type Status } from '../../../../shared/schemas/findings';
import { severityMarker, statusStyle, type MarkerShape, type StatusStyle } from '../../../lib/finding-legend';
import { labelDrop, markerOutline, RING_HOLE } from './marker-outline';
import { HALO_DARK, HALO_LIGHT, LABEL_FONT_FAMILY, PAPER, traceOutline, type Pen } from './pen';

/** What one marker shows: its outline, fill and the text on it, with an optional glyph badge. */
export interface MarkerLook {
  readonly shape: MarkerShape;
  readonly fill: string;
  readonly ink: string;
  readonly text: string;
  readonly glyph?: string;
}

/** Worked out once: a redraw of a thousand markers should not compute contrast ratios a thousand times. */
const styles = Object.fromEntries(statuses.map((s) => [s, statusStyle(s)])) as Record<Status, StatusStyle>;
export const styleOf = (status: Status): StatusStyle => styles[status];

/** A finding's marker: the severity gives the shape, the status the fill and the badge glyph. */
export function findingLook(number: number, status: Status, severity: Severity): MarkerLook {
  const style = styles[status];
  return {
    shape: severityMarker(severity).shape,
    fill: style.colour,
    ink: style.ink,
    text: String(number),
    glyph: style.glyph,
  };
}

/** Font size for the number: three digits need a smaller size to stay inside the marker. */
const labelPx = (r: number, text: string): number => Math.round(r * (text.length >= 3 ? 0.72 : 0.88));

/** The badge's disc, CSS px. */
export const BADGE_RADIUS = 7.5;

/** Draw a marker centred on `x`, `y` with radius `r` stage px: its size does not change with the zoom. */
export function drawMarker(pen: Pen, x: number, y: number, r: number, look: MarkerLook): void {
  drawMarkerBody(pen, x, y, r, look);
  drawMarkerLabel(pen, x, y, r, look);
  if (look.glyph) drawBadge(pen, x + badgeOffset(r), y - badgeOffset(r), look.glyph);
}

/** Where a marker's status badge sits from its centre, stage px. */
export const badgeOffset = (r: number) => r * 0.95;

/** The marker's outline with its halo and fill (and a ring's paper hole): everything but its number and badge. */
export function drawMarkerBody(
  pen: Pen,
  x: number,
  y: number,
  r: number,
  look: Pick<MarkerLook, 'shape' | 'fill'>,
): void {
  traceOutline(pen, markerOutline(look.shape, r), x, y);
  pen.lineJoin = 'round';
  pen.strokeStyle = HALO_DARK;
  pen.lineWidth = 7;
  pen.stroke();
  pen.strokeStyle = HALO_LIGHT;
  pen.lineWidth = 4;
  pen.stroke();
  pen.fillStyle = look.fill;
  pen.fill();
  if (look.shape === 'ring') {
    traceOutline(pen, { kind: 'circle', r: r * RING_HOLE }, x, y);
    pen.fillStyle = PAPER;
    pen.fill();
  }
}

/** The marker's number, in its ink (black inside a ring's paper hole). */
export function drawMarkerLabel(pen: Pen, x: number, y: number, r: number, look: MarkerLook): void {
  pen.fillStyle = look.shape === 'ring' ? '#000000' : look.ink;
  pen.font = `bold ${labelPx(r, look.text)}px ${LABEL_FONT_FAMILY}`;
  pen.textAlign = 'center';
  pen.textBaseline = 'middle';
  pen.fillText(look.text, x, y + labelDrop(look.shape, r));
}

/** The status glyph on a small white disc at the marker's upper right: it reads without any colour. */
export function drawBadge(pen: Pen, x: number, y: number, glyph: string): void {
  traceOutline(pen, { kind: 'circle', r: BADGE_RADIUS }, x, y);
  pen.fillStyle = HALO_LIGHT;
  pen.fill();
  pen.strokeStyle = HALO_DARK;
  pen.lineWidth = 1.5;
  pen.stroke();
  pen.fillStyle = '#000000';
  pen.font = `bold 10px ${LABEL_FONT_FAMILY}`;
  pen.textAlign = 'center';
  pen.textBaseline = 'middle';
  pen.fillText(glyph, x, y + 0.5);
}
