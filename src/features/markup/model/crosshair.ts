/**
 * The keyboard's way onto the photo: a crosshair that the arrow keys move and Enter acts at. Pure; the canvas
 * keeps the state and draws it. Steps are in stage px, so a press moves the same distance on screen at any zoom.
 */
import type { Command } from './commands';
import {
  imageToStage,
  stagePoint,
  stageToImage,
  type ImagePoint,
  type ImageSize,
  type StageSize,
  type ViewTransform,
} from './coordinates';
import { clampToImage, rectPoints, type Geometry } from './geometry';
import { DRAG_THRESHOLD_PX } from './gesture';
import { hitTest, HIT_TOLERANCE_PX } from './hit-test';
import type { Tool } from './tools';

/** Stage px per arrow press, and with Shift held. */
export const CROSSHAIR_STEP_PX = 8;
export const CROSSHAIR_SHIFT_STEP_PX = 48;
/** A finding this close to the crosshair (stage px) is named in what screen readers hear. */
export const NEAR_PX = 32;
/** Stage px kept between the crosshair and the stage's edge when the view follows it. */
const FOLLOW_MARGIN_PX = 24;

export interface CrosshairState {
  readonly at: ImagePoint;
  /** Where a box, circle, arrow or stroke began: set by the first Enter, used by the second. */
  readonly anchor?: ImagePoint;
}

export interface CrosshairContext {
  readonly view: ViewTransform;
  readonly image: ImageSize;
}

/** Where the crosshair starts: the middle of what the stage shows, kept on the photo. */
export function startCrosshair(view: ViewTransform, image: ImageSize, stage: StageSize): CrosshairState {
  return { at: clampToImage(stageToImage(stagePoint(stage.width / 2, stage.height / 2), view, image)) };
}

/** One arrow press: `dx`, `dy` are −1, 0 or 1; `big` is Shift. The crosshair stops at the photo's edge. */
export function moveCrosshair(
  state: CrosshairState,
  dx: number,
  dy: number,
  big: boolean,
  ctx: CrosshairContext,
): CrosshairState {
  const px = big ? CROSSHAIR_SHIFT_STEP_PX : CROSSHAIR_STEP_PX;
  const perX = px / (ctx.view.scale * ctx.image.width);
  const perY = px / (ctx.view.scale * ctx.image.height);
  return { ...state, at: clampToImage({ x: state.at.x + Math.sign(dx) * perX, y: state.at.y + Math.sign(dy) * perY }) };
}

/** The geometry a shape takes between the anchor and the crosshair. */
function shapeBetween(tool: Exclude<Tool, 'select' | 'pin'>, a: ImagePoint, b: ImagePoint): Geometry {
  return { shape: tool, points: tool === 'rect' ? rectPoints(a, b) : [a, b] };
}

export type EnterResult =
  | { readonly kind: 'create'; readonly command: Command; readonly state: CrosshairState }
  | { readonly kind: 'started'; readonly state: CrosshairState }
  | { readonly kind: 'too-small'; readonly state: CrosshairState }
  | { readonly kind: 'select'; readonly id: number | null; readonly state: CrosshairState };

/**
 * Enter at the crosshair. A pin is placed at once; any other shape starts at the first Enter and is made at the
 * second (unless the two points are too close to see). With Select, Enter picks the finding under the crosshair.
 */
export function crosshairEnter(
  tool: Tool,
  state: CrosshairState,
  ctx: CrosshairContext,
  marks: readonly MarkLike[],
): EnterResult {
  if (tool === 'select') return { kind: 'select', id: markUnder(state.at, ctx, marks)?.id ?? null, state };
  if (tool === 'pin')
    return { kind: 'create', command: { type: 'create', shape: 'pin', points: [state.at] }, state: { at: state.at } };
  if (!state.anchor) return { kind: 'started', state: { at: state.at, anchor: state.at } };
  const a = imageToStage(state.anchor, ctx.view, ctx.image);
  const b = imageToStage(state.at, ctx.view, ctx.image);
  if (Math.hypot(a.x - b.x, a.y - b.y) < DRAG_THRESHOLD_PX) return { kind: 'too-small', state };
  const shape = shapeBetween(tool, state.anchor, state.at);
  return {
    kind: 'create',
    command: { type: 'create', shape: shape.shape, points: shape.points },
    state: { at: state.at },
  };
}

/** The shape under way between the anchor and the crosshair, drawn dashed like a drag in progress. */
export function crosshairDraft(tool: Tool, state: CrosshairState): Geometry | undefined {
  if (!state.anchor || tool === 'select' || tool === 'pin') return undefined;
  return shapeBetween(tool, state.anchor, state.at);
}

/** What the canvas needs of a finding to name it: its id, number and mark. */
export type MarkLike = Geometry & { readonly id: number; readonly number: number };

function markUnder(
  at: ImagePoint,
  ctx: CrosshairContext,
  marks: readonly MarkLike[],
  tolerance = HIT_TOLERANCE_PX,
): MarkLike | null {
  return hitTest(marks, imageToStage(at, ctx.view, ctx.image), ctx.view, ctx.image, tolerance);
}

const percent = (v: number) => `${Math.round(v * 100)} %`;

/** What screen readers hear: "42 % across, 61 % down, near #3", and how to finish a shape once it has begun. */
export function describeCrosshair(
  tool: Tool,
  state: CrosshairState,
  ctx: CrosshairContext,
  marks: readonly MarkLike[],
): string {
  const near = markUnder(state.at, ctx, marks, NEAR_PX);
  const where = `${percent(state.at.x)} across, ${percent(state.at.y)} down${near ? `, near #${near.number}` : ''}`;
  if (state.anchor && tool !== 'select' && tool !== 'pin')
    return `${where}. Started at ${percent(state.anchor.x)} across, ${percent(state.anchor.y)} down; Enter finishes it.`;
  return where;
}

/** How far to pan (stage px) so the crosshair stays on the stage; zero when it is already in view. */
export function followCrosshair(at: ImagePoint, ctx: CrosshairContext, stage: StageSize): { dx: number; dy: number } {
  const p = imageToStage(at, ctx.view, ctx.image);
  const m = Math.min(FOLLOW_MARGIN_PX, stage.width / 4, stage.height / 4);
  const dx = p.x < m ? m - p.x : p.x > stage.width - m ? stage.width - m - p.x : 0;
  const dy = p.y < m ? m - p.y : p.y > stage.height - m ? stage.height - m - p.y : 0;
  return { dx, dy };
}
