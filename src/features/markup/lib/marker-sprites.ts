import { badgeOffset, BADGE_RADIUS, drawBadge, drawMarkerBody, drawMarkerLabel } from './draw-marker';
import type { MarkerPainter } from './draw-marks';

/** Enough room around a marker's centre for its largest shape (the triangle) and its halo, CSS px. */
const halfExtent = (r: number) => Math.ceil(1.45 * r + 4) + 1;
/** Room around a badge's centre for its disc and rim, CSS px. */
const BADGE_HALF = Math.ceil(BADGE_RADIUS + 1) + 1;
/** Sizes change with the zoom for lines' labels: the cache is cleared before it holds too many bitmaps. */
const MAX_SPRITES = 400;

/**
 * A marker painter that draws each distinct marker body (outline, halo, fill) and each status badge once into a
 * small bitmap at the device pixel ratio and then stamps them, writing each marker's number between the two: a
 * thousand markers become a few dozen bitmaps and a thousand image copies and short texts, instead of a thousand
 * paths and halos (or a thousand bitmaps, one per number, which made the first frame slow). Stamps land on whole
 * device pixels so they stay as crisp as drawn ones. The result is the same picture as `drawMarker`.
 */
export function createSpritePainter(pixelRatio: number): MarkerPainter {
  const sprites = new Map<string, HTMLCanvasElement | null>();
  const sprite = (
    key: string,
    half: number,
    paint: (pen: CanvasRenderingContext2D) => void,
  ): HTMLCanvasElement | null => {
    const cached = sprites.get(key);
    if (cached !== undefined) return cached;
    const canvas = document.createElement('canvas');
    canvas.width = Math.ceil(2 * half * pixelRatio);
    canvas.height = canvas.width;
    const context = canvas.getContext('2d');
    if (sprites.size >= MAX_SPRITES) sprites.clear();
    if (context) {
      context.scale(pixelRatio, pixelRatio);
      paint(context);
    }
    sprites.set(key, context ? canvas : null);
    return context ? canvas : null;
  };
  const snap = (v: number) => Math.round(v * pixelRatio) / pixelRatio;
  return (pen, x, y, r, look) => {
    const draw = (pen as Partial<CanvasRenderingContext2D>).drawImage?.bind(pen);
    const half = halfExtent(r);
    const body = draw
      ? sprite(`${r}|${look.shape}|${look.fill}`, half, (c) => drawMarkerBody(c, half, half, r, look))
      : null;
    if (!draw || !body) {
      drawMarkerBody(pen, x, y, r, look);
    } else {
      draw(body, snap(x - half), snap(y - half), body.width / pixelRatio, body.height / pixelRatio);
    }
    drawMarkerLabel(pen, x, y, r, look);
    if (!look.glyph) return;
    const bx = x + badgeOffset(r);
    const by = y - badgeOffset(r);
    const badge = draw
      ? sprite(`badge|${look.glyph}`, BADGE_HALF, (c) => drawBadge(c, BADGE_HALF, BADGE_HALF, look.glyph!))
      : null;
    if (!draw || !badge) drawBadge(pen, bx, by, look.glyph);
    else draw(badge, snap(bx - BADGE_HALF), snap(by - BADGE_HALF), badge.width / pixelRatio, badge.height / pixelRatio);
  };
}
