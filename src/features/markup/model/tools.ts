import type { Shape } from '../../../../shared/schemas/findings';
import type { Command } from './commands';
import { clampToImage, rectPoints, simplifyFreehand } from './geometry';
import {
  follow,
  idle,
  press,
  stageDistance,
  DRAG_THRESHOLD_PX,
  type Draft,
  type ToolContext,
  type ToolEvent,
  type ToolResult,
  type ToolState,
} from './gesture';
import { selectTransition } from './select-tool';

export {
  DRAG_THRESHOLD_PX,
  idle,
  type Draft,
  type Gesture,
  type ToolContext,
  type ToolEvent,
  type ToolResult,
  type ToolState,
} from './gesture';

export type Tool = 'select' | Shape;
export const tools: readonly Tool[] = ['select', 'pin', 'circle', 'rect', 'arrow', 'freehand'];

/** Freehand strokes are simplified to within this many stage px of what was drawn, at the zoom it was drawn at. */
const FREEHAND_TOLERANCE_PX = 1;

function draftOf(shape: Shape, state: ToolState): Draft | undefined {
  if (state.phase === 'idle') return undefined;
  if (shape === 'pin') return { shape, points: [state.last] };
  if (state.phase !== 'dragging') return undefined;
  if (shape === 'freehand') return state.trail.length >= 2 ? { shape, points: state.trail } : undefined;
  return { shape, points: shape === 'rect' ? rectPoints(state.start, state.last) : [state.start, state.last] };
}

/** The command a finished gesture makes, if any. */
function createOf(shape: Shape, state: ToolState, ctx: ToolContext): Command | undefined {
  if (state.phase === 'idle') return undefined;
  if (shape === 'pin') return { type: 'create', shape, points: [state.last] };
  if (shape === 'freehand') {
    if (state.phase !== 'dragging' || state.trail.length < 2) return undefined;
    const points = simplifyFreehand(state.trail, FREEHAND_TOLERANCE_PX / ctx.view.scale, ctx.image);
    return { type: 'create', shape, points };
  }
  // A click, or a drag that came back to where it began, would make a mark too small to see or grab.
  if (stageDistance(state.start, state.last, ctx) < DRAG_THRESHOLD_PX) return undefined;
  return {
    type: 'create',
    shape,
    points: shape === 'rect' ? rectPoints(state.start, state.last) : [state.start, state.last],
  };
}

/** Pin, circle, rect, arrow and freehand: press, drag (or, for a pin, adjust), release to create. */
function drawTransition(shape: Shape, state: ToolState, event: ToolEvent, ctx: ToolContext): ToolResult {
  if (event.type === 'escape') return { state: idle };
  const point = clampToImage(event.point);
  if (event.type === 'down') {
    const next = press(point);
    return { state: next, draft: draftOf(shape, next) };
  }
  if (state.phase === 'idle') return { state };
  const next = follow(state, point, ctx, shape === 'freehand');
  if (event.type === 'move') return { state: next, draft: draftOf(shape, next) };
  return { state: idle, command: createOf(shape, next, ctx) };
}

/** Advance the current tool's machine by one event. */
export function transition(tool: Tool, state: ToolState, event: ToolEvent, ctx: ToolContext): ToolResult {
  return tool === 'select' ? selectTransition(state, event, ctx) : drawTransition(tool, state, event, ctx);
}
