import type { Kind, Severity, Shape, Status } from '../../../../shared/schemas/findings';
import type { ImagePoint } from './coordinates';
import type { Handle } from './geometry';

/** A finding's editable fields other than its mark, as the finding panel changes them. */
export interface FieldValues {
  readonly title?: string;
  readonly componentRef?: string;
  readonly kind?: Kind;
  readonly severity?: Severity;
  readonly status?: Status;
  readonly dismissReason?: string | null;
  readonly ownerVisible?: boolean;
}

/**
 * A change the canvas asks the server for. Points and deltas are normalised image coordinates. Tools emit
 * create, move and resize; undo answers with their inverses, which also need delete and edit.
 */
export type Command =
  | {
      readonly type: 'create';
      readonly shape: Shape;
      readonly points: readonly ImagePoint[];
      readonly fields?: FieldValues;
    }
  | { readonly type: 'delete'; readonly id: number }
  | { readonly type: 'move'; readonly id: number; readonly dx: number; readonly dy: number }
  | { readonly type: 'resize'; readonly id: number; readonly handle: Handle; readonly to: ImagePoint }
  | {
      readonly type: 'edit';
      readonly id: number;
      readonly fields?: FieldValues;
      readonly points?: readonly ImagePoint[];
    };
