/**
 * The markup canvas's three units:
 * - normalised: 0..1 of the upright image's width and height — what a finding stores, the truth (`ImagePoint`);
 * - image px: pixels of the full-size upright image (`ImageSize`);
 * - stage px: CSS px on the canvas stage, what the pointer reports (`StagePoint`).
 * Only `stageToImage` and `imageToStage` convert a point between image and stage; the helpers below build or adjust
 * a `ViewTransform` and never hand out a point of one space typed as the other.
 */
declare const normalisedSpace: unique symbol;
declare const stageSpace: unique symbol;

/** Normalised image coordinates, 0..1 of the upright image. */
export type ImagePoint = { readonly x: number; readonly y: number; readonly [normalisedSpace]: true };
/** Stage coordinates in CSS px. */
export type StagePoint = { readonly x: number; readonly y: number; readonly [stageSpace]: true };

export const imagePoint = (x: number, y: number): ImagePoint => ({ x, y }) as ImagePoint;
export const stagePoint = (x: number, y: number): StagePoint => ({ x, y }) as StagePoint;

/** `scale` is stage px per image px; `x`, `y` are where the image's top-left corner sits on the stage, in stage px. */
export interface ViewTransform {
  readonly scale: number;
  readonly x: number;
  readonly y: number;
}

/** A width and height: image px for `ImageSize`, stage px for `StageSize`. */
export interface Size {
  readonly width: number;
  readonly height: number;
}
export type ImageSize = Size;
export type StageSize = Size;

/** An axis-aligned box in normalised image coordinates. */
export interface ImageBounds {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/** Allowed `ViewTransform.scale`, stage px per image px. */
export interface ZoomLimits {
  readonly min: number;
  readonly max: number;
}

/** 8× actual size: far enough to place a pin on one solder joint, beyond which a photo only shows blur. */
export const MAX_ZOOM = 8;
/** Stage px left around the image by `fitTransform` unless told otherwise. */
export const FIT_PADDING_PX = 16;
/** Stage px of the image that panning always leaves on screen, so the photo cannot be lost off the edge. */
export const KEEP_VISIBLE_PX = 64;
/** A finding opened by URL fills about this share of the stage, leaving its surroundings in view. */
const FOCUS_FILL = 0.5;
/** Default cap when focusing on a finding: 2× actual size, so a pin does not jump to the 8× limit. */
const FOCUS_MAX_SCALE = 2;

export function stageToImage(p: StagePoint, view: ViewTransform, image: ImageSize): ImagePoint {
  return imagePoint((p.x - view.x) / view.scale / image.width, (p.y - view.y) / view.scale / image.height);
}

export function imageToStage(p: ImagePoint, view: ViewTransform, image: ImageSize): StagePoint {
  return stagePoint(view.x + p.x * image.width * view.scale, view.y + p.y * image.height * view.scale);
}

const clamp = (value: number, min: number, max: number): number => Math.min(max, Math.max(min, value));

export const clampScale = (scale: number, limits: ZoomLimits): number => clamp(scale, limits.min, limits.max);

/** The transform at `scale` that puts the image point `focus` at the centre of the stage. */
function centredOn(image: ImageSize, stage: StageSize, scale: number, focus: ImagePoint): ViewTransform {
  const at = imageToStage(focus, { scale, x: 0, y: 0 }, image);
  return { scale, x: stage.width / 2 - at.x, y: stage.height / 2 - at.y };
}

/** The whole image visible and centred, `padding` stage px clear of the stage's edges where there is room for it. */
export function fitTransform(image: ImageSize, stage: StageSize, padding = FIT_PADDING_PX): ViewTransform {
  // On a tiny stage a fixed padding would leave nothing for the photo; never take more than a quarter per side.
  const pad = clamp(padding, 0, Math.min(stage.width, stage.height) / 4);
  const scale = Math.min((stage.width - 2 * pad) / image.width, (stage.height - 2 * pad) / image.height);
  return centredOn(image, stage, scale, imagePoint(0.5, 0.5));
}

/** 100 %: one image px per stage (CSS) px, centred on `focus` (the image centre by default). */
export function actualSize(
  image: ImageSize,
  stage: StageSize,
  focus: ImagePoint = imagePoint(0.5, 0.5),
): ViewTransform {
  return centredOn(image, stage, 1, focus);
}

/** Half the fit scale up to 8× actual size; a photo smaller than the stage may still be fitted, so `max` ≥ fit. */
export function zoomLimits(image: ImageSize, stage: StageSize, padding = FIT_PADDING_PX): ZoomLimits {
  const fit = fitTransform(image, stage, padding).scale;
  const max = Math.max(MAX_ZOOM, fit);
  return { min: Math.min(fit / 2, max), max };
}

/** Multiply the scale by `factor` (clamped to `limits`) keeping the image under the stage point `at` where it is. */
export function zoomAt(view: ViewTransform, at: StagePoint, factor: number, limits: ZoomLimits): ViewTransform {
  const scale = clampScale(view.scale * factor, limits);
  // The offset from the image's corner to `at`, in stage px, grows with the scale; the corner moves to compensate.
  const k = scale / view.scale;
  return { scale, x: at.x - (at.x - view.x) * k, y: at.y - (at.y - view.y) * k };
}

/** Move the image by `dx`, `dy` stage px; combine with `clampPan`. */
export const pan = (view: ViewTransform, dx: number, dy: number): ViewTransform => ({
  ...view,
  x: view.x + dx,
  y: view.y + dy,
});

/** Keep at least `keepPx` stage px of the image (or all of it, when smaller) on the stage along each axis. */
export function clampPan(
  view: ViewTransform,
  image: ImageSize,
  stage: StageSize,
  keepPx = KEEP_VISIBLE_PX,
): ViewTransform {
  const w = image.width * view.scale;
  const h = image.height * view.scale;
  const keepX = Math.min(keepPx, w);
  const keepY = Math.min(keepPx, h);
  return {
    ...view,
    x: clamp(view.x, keepX - w, stage.width - keepX),
    y: clamp(view.y, keepY - h, stage.height - keepY),
  };
}

const isBounds = (target: ImagePoint | ImageBounds): target is ImageBounds => 'minX' in target;

/**
 * Centre a finding on the stage, e.g. when its URL is opened. `zoom` (stage px per image px) wins when given;
 * otherwise bounds fill about half the stage (at most 2× actual size) and a point keeps the current scale but
 * at least actual size. The result is always within `zoomLimits`.
 */
export function focusOn(
  view: ViewTransform,
  image: ImageSize,
  stage: StageSize,
  target: ImagePoint | ImageBounds,
  zoom?: number,
): ViewTransform {
  let centre: ImagePoint;
  let scale: number;
  if (isBounds(target)) {
    centre = imagePoint((target.minX + target.maxX) / 2, (target.minY + target.maxY) / 2);
    // Zero-size bounds give Infinity here, which the cap and the limits bring back.
    const widthPx = (target.maxX - target.minX) * image.width;
    const heightPx = (target.maxY - target.minY) * image.height;
    const fill = Math.min((stage.width * FOCUS_FILL) / widthPx, (stage.height * FOCUS_FILL) / heightPx);
    scale = zoom ?? Math.min(fill, FOCUS_MAX_SCALE);
  } else {
    centre = target;
    scale = zoom ?? Math.max(view.scale, 1);
  }
  return centredOn(image, stage, clampScale(scale, zoomLimits(image, stage)), centre);
}

export type TouchPair = readonly [StagePoint, StagePoint];

const distance = (a: StagePoint, b: StagePoint): number => Math.hypot(a.x - b.x, a.y - b.y);

/** Two fingers: scale by the change in their distance, and carry the image under their midpoint along with it. */
export function pinchZoom(view: ViewTransform, prev: TouchPair, next: TouchPair, limits?: ZoomLimits): ViewTransform {
  const before = distance(prev[0], prev[1]);
  // Fingers that start on the same spot give no ratio; treat the step as a two-finger pan.
  const factor = before > 0 ? distance(next[0], next[1]) / before : 1;
  const scale = limits ? clampScale(view.scale * factor, limits) : view.scale * factor;
  const k = scale / view.scale;
  const from = { x: (prev[0].x + prev[1].x) / 2, y: (prev[0].y + prev[1].y) / 2 };
  const to = { x: (next[0].x + next[1].x) / 2, y: (next[0].y + next[1].y) / 2 };
  return { scale, x: to.x - (from.x - view.x) * k, y: to.y - (from.y - view.y) * k };
}
