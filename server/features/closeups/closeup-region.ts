import type { NormalisedPoint, Shape } from '../../../shared/schemas/findings';

/**
 * The pixel region of an upright image that shows a finding with some context around it: the
 * shape's bounds (a circle's full disc; a pin gets a square) widened by half, at least `minPx` across.
 */
export function closeupRegion(
  shape: Shape,
  points: NormalisedPoint[],
  image: { width: number; height: number },
  minPx = 320,
) {
  const px = points.map((p) => ({ x: p.x * image.width, y: p.y * image.height }));
  let [x0, y0, x1, y1] = [
    Math.min(...px.map((p) => p.x)),
    Math.min(...px.map((p) => p.y)),
    Math.max(...px.map((p) => p.x)),
    Math.max(...px.map((p) => p.y)),
  ];
  if (shape === 'circle') {
    const r = Math.hypot(px[1]!.x - px[0]!.x, px[1]!.y - px[0]!.y);
    [x0, y0, x1, y1] = [px[0]!.x - r, px[0]!.y - r, px[0]!.x + r, px[0]!.y + r];
  }
  const cx = (x0 + x1) / 2;
  const cy = (y0 + y1) / 2;
  const side = Math.min(Math.max((x1 - x0) * 1.5, (y1 - y0) * 1.5, minPx), image.width, image.height);
  const left = Math.round(Math.min(Math.max(cx - side / 2, 0), image.width - side));
  const top = Math.round(Math.min(Math.max(cy - side / 2, 0), image.height - side));
  return { left, top, width: Math.round(side), height: Math.round(side) };
}
