import type { Command } from '../model/commands';
import type { ImagePoint } from '../model/coordinates';
import { resize, translate, type MarkupItem } from '../model/geometry';
import type { Change } from '../model/history';

export type CreateCommand = Extract<Command, { type: 'create' }>;
export type EditCommand = Extract<Command, { type: 'edit' }>;

/**
 * What the canvas does about a command, through its callbacks: new points for a finding (`onMove`), a delete
 * (`onDelete`), or a create or field edit that only the page can carry out (`onCreate`, `onUndo`). `none` when the
 * command names a finding that is no longer on this photo.
 */
export type Effect =
  | { readonly kind: 'points'; readonly id: number; readonly points: readonly ImagePoint[] }
  | { readonly kind: 'delete'; readonly id: number }
  | { readonly kind: 'create'; readonly command: CreateCommand }
  | { readonly kind: 'fields'; readonly command: EditCommand }
  | { readonly kind: 'none' };

const find = (marks: readonly MarkupItem[], id: number) => marks.find((m) => m.id === id);

export function effectOf(command: Command, marks: readonly MarkupItem[]): Effect {
  if (command.type === 'create') return { kind: 'create', command };
  const item = find(marks, command.id);
  if (!item) return { kind: 'none' };
  switch (command.type) {
    case 'delete':
      return { kind: 'delete', id: item.id };
    case 'move':
      return { kind: 'points', id: item.id, points: translate(item, command.dx, command.dy).points };
    case 'resize':
      return { kind: 'points', id: item.id, points: resize(item, command.handle, command.to).points };
    case 'edit':
      return command.points ? { kind: 'points', id: item.id, points: command.points } : { kind: 'fields', command };
  }
}

/**
 * The history entry for a move or resize the canvas is about to send. A move records what the mark really moved
 * after stopping at the photo's edge, so undo brings it back exactly; a resize keeps the points it replaces.
 */
export function changeOf(command: Command, marks: readonly MarkupItem[]): Change | undefined {
  if (command.type !== 'move' && command.type !== 'resize') return undefined;
  const item = find(marks, command.id);
  if (!item) return undefined;
  if (command.type === 'resize') return { type: 'resized', id: item.id, before: item.points };
  const before = item.points[0];
  const after = translate(item, command.dx, command.dy).points[0];
  if (!before || !after || (after.x === before.x && after.y === before.y)) return undefined;
  return { type: 'moved', id: item.id, dx: after.x - before.x, dy: after.y - before.y };
}
