import { afterEach, describe, expect, it, vi } from 'vitest';
import { recordingPen } from '../testing/recording-pen';
import { drawMarker, findingLook } from './draw-marker';
import { createSpritePainter } from './marker-sprites';

/** Canvases made by the painter: each records what was drawn into it. */
function stubCanvases() {
  const made: ReturnType<typeof recordingPen>[] = [];
  vi.stubGlobal('document', {
    createElement: () => {
      const context = Object.assign(recordingPen(), { scale: () => {} });
      made.push(context);
      return { width: 0, height: 0, getContext: () => context };
    },
  });
  return made;
}
/** The layer's pen, which can also stamp bitmaps. */
const layerPen = () => {
  const pen = recordingPen();
  return Object.assign(pen, {
    drawImage: (...args: unknown[]) =>
      pen.calls.push({
        op: 'drawImage',
        args,
        fillStyle: pen.fillStyle,
        strokeStyle: pen.strokeStyle,
        lineWidth: pen.lineWidth,
      }),
  });
};

afterEach(() => vi.unstubAllGlobals());

describe('createSpritePainter', () => {
  it('when a thousand markers with different numbers are painted, then a few bitmaps are made and every number is written on the layer', () => {
    const made = stubCanvases();
    const paint = createSpritePainter(2);
    const pen = layerPen();
    for (let n = 1; n <= 1000; n++)
      paint(pen, n, 2 * n, 12, findingLook(n, n % 2 ? 'confirmed' : 'observed', n % 3 ? 'fault' : 'cosmetic'));
    expect(made.length).toBeLessThan(10);
    const texts = pen.calls.filter((c) => c.op === 'fillText').map((c) => c.args[0]);
    for (let n = 1; n <= 1000; n++) expect(texts).toContain(String(n));
    // Body first, then its number, then the badge: the order `drawMarker` draws them in.
    const first = pen.calls.slice(0, 3).map((c) => c.op);
    expect(first[0]).toBe('drawImage');
    expect(first[1]).toBe('fillText');
  });

  it('when a marker is stamped, then its bitmap holds what drawMarker draws apart from the number', () => {
    const made = stubCanvases();
    const look = findingLook(7, 'confirmed', 'fault');
    createSpritePainter(1)(layerPen(), 50, 50, 12, look);
    const direct = recordingPen();
    drawMarker(direct, 0, 0, 12, look);
    const ops = (calls: { op: string }[]) => calls.map((c) => c.op);
    const stamped = [...ops(made[0]!.calls), 'fillText', ...ops(made[1]!.calls)];
    expect(stamped).toEqual(ops(direct.calls));
  });

  it('when the pen cannot stamp bitmaps, then markers are drawn directly', () => {
    const made = stubCanvases();
    const pen = recordingPen();
    createSpritePainter(1)(pen, 10, 10, 12, findingLook(3, 'observed', 'fault'));
    expect(made).toHaveLength(0);
    expect(pen.calls.filter((c) => c.op === 'fillText').map((c) => c.args[0])).toContain('3');
  });
});
