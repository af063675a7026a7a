import type { Shape } from '../../../../shared/schemas/findings';
import type { Command, FieldValues } from './commands';
import type { ImagePoint } from './coordinates';

/** How many changes can be undone; older ones fall off the bottom. */
export const HISTORY_LIMIT = 50;

/**
 * A change that reached the server, with what is needed to take it back: the id a created finding was given,
 * everything a deleted one held, and the values an edit or a resize replaced. Deltas are normalised.
 */
export type Change =
  | { readonly type: 'created'; readonly id: number }
  | {
      readonly type: 'deleted';
      readonly shape: Shape;
      readonly points: readonly ImagePoint[];
      readonly fields: FieldValues;
    }
  | { readonly type: 'moved'; readonly id: number; readonly dx: number; readonly dy: number }
  | { readonly type: 'resized'; readonly id: number; readonly before: readonly ImagePoint[] }
  | { readonly type: 'edited'; readonly id: number; readonly before: FieldValues };

/** The undo stack, newest last, held as the commands that would take each change back. */
export interface UndoHistory {
  readonly inverses: readonly Command[];
  readonly limit: number;
}

export const emptyHistory = (limit = HISTORY_LIMIT): UndoHistory => ({ inverses: [], limit });

/** The command that takes a change back. */
export function inverseOf(change: Change): Command {
  switch (change.type) {
    case 'created':
      return { type: 'delete', id: change.id };
    case 'deleted':
      return { type: 'create', shape: change.shape, points: change.points, fields: change.fields };
    case 'moved':
      // The recorded delta is what the mark really moved after stopping at the edge, so the way back is exact.
      return { type: 'move', id: change.id, dx: -change.dx, dy: -change.dy };
    case 'resized':
      // Handles can cross (a rect flips), so put the points back rather than replaying the handle.
      return { type: 'edit', id: change.id, points: change.before };
    case 'edited':
      return { type: 'edit', id: change.id, fields: change.before };
  }
}

export function push(history: UndoHistory, change: Change): UndoHistory {
  const inverses = [...history.inverses, inverseOf(change)];
  return { ...history, inverses: inverses.slice(Math.max(0, inverses.length - history.limit)) };
}

/** Take the newest change off the stack; send the returned command to the server. Null when there is nothing to undo. */
export function undo(history: UndoHistory): { history: UndoHistory; command: Command } | null {
  const command = history.inverses[history.inverses.length - 1];
  if (!command) return null;
  return { history: { ...history, inverses: history.inverses.slice(0, -1) }, command };
}

export const canUndo = (history: UndoHistory): boolean => history.inverses.length > 0;

/**
 * Undoing a delete re-creates the finding under a new id; once the server answers, older entries that
 * named the old id must name the new one, or undoing them would miss.
 */
export function remapId(history: UndoHistory, from: number, to: number): UndoHistory {
  const inverses = history.inverses.map((c) => (c.type !== 'create' && c.id === from ? { ...c, id: to } : c));
  return { ...history, inverses };
}
