/** One press of +, −, or the zoom buttons multiplies or divides the scale by this. */
export const ZOOM_STEP = 1.25;

/** Pixels per wheel "line" and "page" (WheelEvent.deltaMode 1 and 2), so every mouse and trackpad zooms alike. */
const LINE_PX = 16;
const PAGE_PX = 800;
/** Scale change per wheel pixel: a mouse notch (~100 px) is about ×1.22; a trackpad pinch (Ctrl + small deltas) is finer. */
const WHEEL_RATE = 0.002;
const PINCH_RATE = 0.01;

/** The zoom factor for one wheel event: scrolling up (negative delta) zooms in. Never more than ×2 or ÷2 at once. */
export function wheelZoomFactor(deltaY: number, deltaMode: number, ctrlKey: boolean): number {
  const px = deltaY * (deltaMode === 1 ? LINE_PX : deltaMode === 2 ? PAGE_PX : 1);
  const factor = Math.exp(-px * (ctrlKey ? PINCH_RATE : WHEEL_RATE));
  return Math.min(2, Math.max(0.5, factor));
}

/** The zoom readout: "100 %" is one photo pixel per screen (CSS) pixel. A no-break space keeps it on one line. */
export function formatZoom(scale: number): string {
  const percent = scale * 100;
  if (percent < 1) return '<1\u00a0%';
  return `${Math.round(percent)}\u00a0%`;
}
