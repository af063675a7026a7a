import { drawMarker, type MarkerLook } from './draw-marker';
import type { MarkerPainter } from './draw-marks';

/** Enough room around a marker's centre for its largest shape (the triangle), its halo and its glyph badge, CSS px. */
const halfExtent = (r: number) => Math.ceil(Math.max(1.45 * r + 4, 0.95 * r + 9.5)) + 1;
/** A photo with thousands of findings should not hold thousands of bitmaps forever. */
const MAX_SPRITES = 4000;

const keyOf = (r: number, look: MarkerLook) => `${r}|${look.shape}|${look.fill}|${look.ink}|${look.text}|${look.glyph ?? ''}`;

/**
 * A marker painter that draws each distinct marker once into a small bitmap at the device pixel ratio and then
 * stamps it: a thousand markers become a thousand image copies instead of a thousand paths, texts and halos,
 * which keeps panning and zooming smooth. Stamps land on whole device pixels so they stay as crisp as drawn ones.
 */
export function createSpritePainter(pixelRatio: number): MarkerPainter {
  const sprites = new Map<string, HTMLCanvasElement>();
  const spriteFor = (r: number, look: MarkerLook): HTMLCanvasElement | undefined => {
    const key = keyOf(r, look);
    const cached = sprites.get(key);
    if (cached) return cached;
    const half = halfExtent(r);
    const canvas = document.createElement('canvas');
    canvas.width = Math.ceil(2 * half * pixelRatio);
    canvas.height = canvas.width;
    const context = canvas.getContext('2d');
    if (!context) return undefined;
    context.scale(pixelRatio, pixelRatio);
    drawMarker(context, half, half, r, look);
    if (sprites.size >= MAX_SPRITES) sprites.clear();
    sprites.set(key, canvas);
    return canvas;
  };
  return (pen, x, y, r, look) => {
    const sprite = spriteFor(r, look);
    const draw = (pen as Partial<CanvasRenderingContext2D>).drawImage?.bind(pen);
    if (!sprite || !draw) {
      drawMarker(pen, x, y, r, look);
      return;
    }
    const half = halfExtent(r);
    const snap = (v: number) => Math.round(v * pixelRatio) / pixelRatio;
    draw(sprite, snap(x - half), snap(y - half), sprite.width / pixelRatio, sprite.height / pixelRatio);
  };
}
