import type { Command } from './commands';
import { clampToImage, resize, translate } from './geometry';
import type { Grab } from './hit-test';
import {
  follow,
  idle,
  press,
  type Draft,
  type ToolContext,
  type ToolEvent,
  type ToolResult,
  type ToolState,
} from './gesture';

/** The held finding as it would be if the pointer were released now. */
function dragged(grab: Grab, state: ToolState): Draft | undefined {
  if (state.phase !== 'dragging') return undefined;
  if (grab.kind === 'handle') return resize(grab.item, grab.handle, state.last);
  return translate(grab.item, state.last.x - state.start.x, state.last.y - state.start.y);
}

/** On release: a move by what the mark actually moved (after stopping at the edge), or a resize. */
function commandOf(grab: Grab, state: ToolState): Command | undefined {
  const draft = dragged(grab, state);
  if (!draft || state.phase === 'idle') return undefined;
  if (grab.kind === 'handle') return { type: 'resize', id: grab.item.id, handle: grab.handle, to: state.last };
  const before = grab.item.points[0];
  const after = draft.points[0];
  if (!before || !after) return undefined;
  const dx = after.x - before.x;
  const dy = after.y - before.y;
  return dx === 0 && dy === 0 ? undefined : { type: 'move', id: grab.item.id, dx, dy };
}

/**
 * Select: a click on a finding selects it, a click on empty photo clears the selection; dragging a finding moves
 * it and dragging a handle of the selected one resizes it. A drag over empty photo is left to the view (panning).
 * Escape drops a drag in progress, or clears the selection when nothing is in progress.
 */
export function selectTransition(state: ToolState, event: ToolEvent, ctx: ToolContext): ToolResult {
  if (event.type === 'escape') return state.phase === 'idle' ? { state, selection: null } : { state: idle };
  const point = clampToImage(event.point);
  if (event.type === 'down') return { state: press(point, ctx.grab ?? null) };
  if (state.phase === 'idle') return { state };
  const next = follow(state, point, ctx);
  const grab = next.phase === 'idle' ? null : next.grab;
  if (event.type === 'move') {
    const draft = grab ? dragged(grab, next) : undefined;
    return { state: next, draft: draft && grab ? { ...draft, id: grab.item.id } : undefined };
  }
  if (next.phase === 'pointing') return { state: idle, selection: grab ? grab.item.id : null };
  if (!grab) return { state: idle };
  return { state: idle, command: commandOf(grab, next), selection: grab.item.id };
}
