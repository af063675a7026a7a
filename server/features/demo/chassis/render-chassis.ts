import sharp from 'sharp';
import type { ChassisView } from './chassis-landmarks';
import { topSvg } from './chassis-top';
import { undersideSvg } from './chassis-underside';

/** The chassis picture for a view as an SVG document, 2400 × 1600, the same every time. */
export function chassisSvg(view: ChassisView): string {
  return view === 'top' ? topSvg() : undersideSvg();
}

/** The chassis picture rendered to a JPEG, as a camera would hand it over. */
export async function renderChassisJpeg(view: ChassisView): Promise<Buffer> {
  return sharp(Buffer.from(chassisSvg(view))).jpeg({ quality: 85 }).toBuffer();
}
