import sharp from 'sharp';
import type { ChassisView } from './chassis-landmarks';
import type { ChassisState } from './chassis-restoration';
import { topSvg } from './chassis-top';
import { undersideSvg } from './chassis-underside';

/**
 * The chassis picture for a view as an SVG document, 2400 × 1600, the same every
 * time: the set as found ('before') or after the work ('after'), from the same spot.
 */
export function chassisSvg(view: ChassisView, state: ChassisState = 'before'): string {
  return view === 'top' ? topSvg(state) : undersideSvg(state);
}

/** The chassis picture rendered to a JPEG, as a camera would hand it over. */
export async function renderChassisJpeg(view: ChassisView, state: ChassisState = 'before'): Promise<Buffer> {
  return sharp(Buffer.from(chassisSvg(view, state)))
    .jpeg({ quality: 85 })
    .toBuffer();
}
