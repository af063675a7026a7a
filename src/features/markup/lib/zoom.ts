/** One press of +, −, or the zoom buttons multiplies or divides the scale by this. */
export const ZOOM_STEP = 1.25;

/** Pixels per wheel "line" and "page" (WheelEvent.deltaMode 1 and 2), so every mouse and trackpad zooms alike. */
const LINE_PX = 16;
const PAGE_PX = 800;
/** Scale change per wheel pixel: a mouse notch (~100 px) is about ×1.16; a trackpad pinch (Ctrl + small deltas) is finer. */
const WHEEL_RATE = 0.0015;
const PINCH_RATE = 0.01;
/**
 * The most one wheel event may change the scale: a notch that reports a large delta (some mice send several
 * hundred px, or pages) still takes one step, so five notches from Fit stay well short of 800 %.
 */
export const MAX_WHEEL_STEP = 1.2;

/** The zoom factor for one wheel event: scrolling up (negative delta) zooms in. Never more than one step at once. */
export function wheelZoomFactor(deltaY: number, deltaMode: number, ctrlKey: boolean): number {
  const px = deltaY * (deltaMode === 1 ? LINE_PX : deltaMode === 2 ? PAGE_PX : 1);
  const factor = Math.exp(-px * (ctrlKey ? PINCH_RATE : WHEEL_RATE));
  return Math.min(MAX_WHEEL_STEP, Math.max(1 / MAX_WHEEL_STEP, factor));
}

/** The zoom readout: "100 %" is one photo pixel per screen (CSS) pixel. A no-break space keeps it on one line. */
export function formatZoom(scale: number): string {
  const percent = scale * 100;
  if (percent < 1) return '<1\u00a0%';
  return `${Math.round(percent)}\u00a0%`;
}
