import type { Finding, Severity, Status } from '../../../../shared/schemas/findings';
import type { ImagePoint } from '../model/coordinates';
import { toMarkupItem, type MarkupItem } from '../model/geometry';

/** A finding as the canvas draws it: its mark plus what the marker shows (number, status, severity). */
export interface Mark extends MarkupItem {
  readonly number: number;
  readonly status: Status;
  readonly severity: Severity;
}

export const toMark = (f: Pick<Finding, 'id' | 'shape' | 'points' | 'number' | 'status' | 'severity'>): Mark => ({
  ...toMarkupItem(f),
  number: f.number,
  status: f.status,
  severity: f.severity,
});

/** The same mark with other points (a drag in progress, or a move the server has not confirmed yet). */
export const withPoints = (mark: Mark, points: readonly ImagePoint[]): Mark => ({ ...mark, points });

/** Points as the API takes them: plain `{ x, y }`, no brand. */
export const plainPoints = (points: readonly ImagePoint[]): { x: number; y: number }[] =>
  points.map((p) => ({ x: p.x, y: p.y }));
