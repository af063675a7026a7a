/** What every tool's state machine shares: its events, states, context and result, and how a press becomes a drag. */
import type { Command } from './commands';
import { imageToStage, type ImagePoint, type ImageSize, type ViewTransform } from './coordinates';
import type { Geometry } from './geometry';
import type { Grab } from './hit-test';

/** Pointer events carry the pointer already in normalised image coordinates (it may lie outside 0..1). */
export type ToolEvent =
  { readonly type: 'down' | 'move' | 'up'; readonly point: ImagePoint } | { readonly type: 'escape' };

/** One gesture in progress. `trail` collects a freehand stroke; `grab` is what the select tool holds. */
export interface Gesture {
  readonly start: ImagePoint;
  readonly last: ImagePoint;
  readonly trail: readonly ImagePoint[];
  readonly grab: Grab | null;
}

/** idle → pointing (button down, not yet moved far) → dragging; Escape or pointer-up returns to idle. */
export type ToolState = { readonly phase: 'idle' } | ({ readonly phase: 'pointing' | 'dragging' } & Gesture);

/**
 * What a transition needs from the world, passed in so the machines stay pure: the view (to measure drags in
 * stage px) and, for the select tool at pointer-down, what lies under the pointer (see `grabAt`).
 */
export interface ToolContext {
  readonly view: ViewTransform;
  readonly image: ImageSize;
  readonly grab?: Grab | null;
}

/** The mark to draw while a gesture is under way; `id` is set when it stands in for an existing finding. */
export type Draft = Geometry & { readonly id?: number };

/** `selection`: undefined leaves it alone, null clears it, a number selects that finding. */
export interface ToolResult {
  readonly state: ToolState;
  readonly draft?: Draft;
  readonly command?: Command;
  readonly selection?: number | null;
}

export const idle: ToolState = { phase: 'idle' };

/** Movement below this many stage px is a click, not a drag. */
export const DRAG_THRESHOLD_PX = 4;
/** A freehand stroke records a point only after the pointer moves this many stage px; finer detail is jitter. */
const FREEHAND_STEP_PX = 1;

/** Distance between two image points as seen on the stage, stage px. */
export function stageDistance(a: ImagePoint, b: ImagePoint, ctx: ToolContext): number {
  const p = imageToStage(a, ctx.view, ctx.image);
  const q = imageToStage(b, ctx.view, ctx.image);
  return Math.hypot(p.x - q.x, p.y - q.y);
}

/** Follow the pointer: record it, and switch to dragging once it has strayed past the threshold. */
export function follow(state: ToolState, point: ImagePoint, ctx: ToolContext, collect = false): ToolState {
  if (state.phase === 'idle') return state;
  const last = state.trail[state.trail.length - 1];
  const record = collect && (!last || stageDistance(last, point, ctx) >= FREEHAND_STEP_PX);
  const dragging = state.phase === 'dragging' || stageDistance(state.start, point, ctx) >= DRAG_THRESHOLD_PX;
  return {
    ...state,
    phase: dragging ? 'dragging' : 'pointing',
    last: point,
    trail: record ? [...state.trail, point] : state.trail,
  };
}

export const press = (point: ImagePoint, grab: Grab | null = null): ToolState => ({
  phase: 'pointing',
  start: point,
  last: point,
  trail: [point],
  grab,
});
