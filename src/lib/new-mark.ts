import type { Shape } from '../../shared/schemas/findings';

/** What `onCreate` hands the page: the new mark's shape and its normalised points. */
export interface NewMark {
  readonly shape: Shape;
  readonly points: { x: number; y: number }[];
}
