import { useEffect, type RefObject } from 'react';
import type { NewMark } from '../../../lib/new-mark';
import { imagePoint, imageToStage, type ImageSize } from '../model/coordinates';
import type { ViewControls } from './use-view';

/** Stage px kept between a waiting mark and whatever covers the photo. */
const CLEARANCE_PX = 48;

/**
 * While a new mark waits for its words, keep it in sight: when `cover` (a bottom sheet over the photo on a phone)
 * lies over the mark, or the mark is above the window's top, pan the photo so the mark sits just clear of it. The
 * page scrolls only when the sheet would leave too little of the photo, and then it brings the photo up.
 */
export function useRevealPending(
  stage: RefObject<HTMLElement | null>,
  cover: RefObject<HTMLElement | null> | undefined,
  pending: NewMark | undefined,
  view: ViewControls,
  image: ImageSize,
) {
  useEffect(() => {
    const node = stage.current;
    const point = pending?.points[pending.shape === 'pin' ? 0 : pending.points.length - 1];
    const v = view.latest();
    if (!node || !point || !v) return;
    let rect = node.getBoundingClientRect();
    const sheet = cover?.current?.getBoundingClientRect();
    const at = imageToStage(imagePoint(point.x, point.y), v, image);
    const clientX = rect.left + at.x;
    // Little of the photo above the sheet: bring the photo up to the window's top (towards the mark, never away).
    if (
      sheet &&
      sheet.height > 0 &&
      clientX >= sheet.left &&
      clientX <= sheet.right &&
      rect.top > sheet.top - 3 * CLEARANCE_PX
    ) {
      window.scrollBy({ top: rect.top, behavior: 'instant' });
      rect = node.getBoundingClientRect();
    }
    const clientY = rect.top + at.y;
    const covered =
      sheet &&
      sheet.height > 0 &&
      clientX >= sheet.left &&
      clientX <= sheet.right &&
      clientY > sheet.top - CLEARANCE_PX;
    const bottom = Math.min(rect.bottom, covered ? sheet.top : rect.bottom);
    const top = Math.max(rect.top, 0);
    if (covered && bottom - top > 2 * CLEARANCE_PX) view.panBy(0, bottom - CLEARANCE_PX - clientY);
    // The page scrolled so far that the mark is above the window: bring it down into sight.
    else if (rect.top < 0 && clientY < CLEARANCE_PX / 2) view.panBy(0, top + CLEARANCE_PX - clientY);
    // Only when a mark starts to wait; the person may pan on from there.
  }, [pending]);
}
