import { describe, expect, it } from 'vitest';
import {
  imagePoint as p,
  imageToStage,
  stagePoint,
  type ImagePoint,
  type StagePoint,
  type ViewTransform,
} from './coordinates';
import type { Geometry, MarkupItem } from './geometry';
import { grabAt, hitHandle, hits, hitTest, PIN_MARKER_RADIUS_PX } from './hit-test';

const image = { width: 1000, height: 800 };
const zooms: [string, ViewTransform][] = [
  ['zoomed out (0.5 stage px per image px)', { scale: 0.5, x: 20, y: 30 }],
  ['zoomed in (4 stage px per image px)', { scale: 4, x: -1500, y: -1000 }],
];

/** The stage point `along` stage px from image point `q` in the unit direction (ux, uy). */
function offStage(q: ImagePoint, view: ViewTransform, ux: number, uy: number, along: number): StagePoint {
  const s = imageToStage(q, view, image);
  return stagePoint(s.x + ux * along, s.y + uy * along);
}

/** The stage point `along` stage px from the middle of a–b, at right angles to it on screen. */
function offSegment(a: ImagePoint, b: ImagePoint, view: ViewTransform, along: number): StagePoint {
  const sa = imageToStage(a, view, image);
  const sb = imageToStage(b, view, image);
  const length = Math.hypot(sb.x - sa.x, sb.y - sa.y);
  const nx = -(sb.y - sa.y) / length;
  const ny = (sb.x - sa.x) / length;
  return stagePoint((sa.x + sb.x) / 2 + nx * along, (sa.y + sb.y) / 2 + ny * along);
}

const pin: Geometry = { shape: 'pin', points: [p(0.9, 0.9)] };
const circle: Geometry = { shape: 'circle', points: [p(0.5, 0.5), p(0.6, 0.5)] };
const rect: Geometry = { shape: 'rect', points: [p(0.2, 0.2), p(0.4, 0.4)] };
const arrow: Geometry = { shape: 'arrow', points: [p(0.1, 0.6), p(0.3, 0.9)] };
const freehand: Geometry = { shape: 'freehand', points: [p(0.6, 0.1), p(0.7, 0.2), p(0.8, 0.1)] };

describe.each(zooms)('hits, %s', (_zoom, view) => {
  it('when the pointer is within the pin marker’s 14 px screen radius, then the pin is hit; beyond it, not', () => {
    expect(hits(pin, offStage(p(0.9, 0.9), view, 0.6, 0.8, PIN_MARKER_RADIUS_PX - 1), view, image)).toBe(true);
    expect(hits(pin, offStage(p(0.9, 0.9), view, 0.6, 0.8, PIN_MARKER_RADIUS_PX + 1), view, image)).toBe(false);
  });

  it('when the pointer is inside a circle or 8 px outside its rim, then it is hit; 12 px outside, not', () => {
    expect(hits(circle, offStage(p(0.5, 0.5), view, 1, 0, 3), view, image)).toBe(true);
    expect(hits(circle, offStage(p(0.6, 0.5), view, 1, 0, 8), view, image)).toBe(true);
    expect(hits(circle, offStage(p(0.6, 0.5), view, 1, 0, 12), view, image)).toBe(false);
  });

  it('when the pointer is inside a rect or 8 px past an edge, then it is hit; 12 px past, not', () => {
    expect(hits(rect, offStage(p(0.3, 0.3), view, 0, 0, 0), view, image)).toBe(true);
    expect(hits(rect, offStage(p(0.2, 0.3), view, -1, 0, 8), view, image)).toBe(true);
    expect(hits(rect, offStage(p(0.3, 0.4), view, 0, 1, 12), view, image)).toBe(false);
  });

  it('when the pointer is 8 px from an arrow’s shaft, then it is hit; 12 px, or inside its box far from the shaft, not', () => {
    expect(hits(arrow, offSegment(arrow.points[0] ?? p(0, 0), arrow.points[1] ?? p(0, 0), view, 8), view, image)).toBe(
      true,
    );
    expect(
      hits(arrow, offSegment(arrow.points[0] ?? p(0, 0), arrow.points[1] ?? p(0, 0), view, -12), view, image),
    ).toBe(false);
    expect(hits(arrow, imageToStage(p(0.28, 0.62), view, image), view, image)).toBe(false);
  });

  it('when the pointer is 8 px from any stroke segment, then the freehand mark is hit; 12 px, not', () => {
    expect(hits(freehand, offSegment(p(0.7, 0.2), p(0.8, 0.1), view, 8), view, image)).toBe(true);
    expect(hits(freehand, offSegment(p(0.7, 0.2), p(0.8, 0.1), view, -12), view, image)).toBe(false);
    expect(hits(freehand, imageToStage(p(0.7, 0.12), view, image), view, image)).toBe(false);
  });
});

describe('hitTest', () => {
  const view: ViewTransform = { scale: 1, x: 0, y: 0 };
  const under: MarkupItem = { id: 1, shape: 'rect', points: [p(0.1, 0.1), p(0.5, 0.5)] };
  const over: MarkupItem = { id: 2, shape: 'circle', points: [p(0.3, 0.3), p(0.35, 0.3)] };

  it('when two findings overlap under the pointer, then the one drawn last wins', () => {
    const at = imageToStage(p(0.3, 0.3), view, image);
    expect(hitTest([under, over], at, view, image)?.id).toBe(2);
    expect(hitTest([over, under], at, view, image)?.id).toBe(1);
  });

  it('when only the lower finding is under the pointer, then it is found', () => {
    expect(hitTest([under, over], imageToStage(p(0.12, 0.45), view, image), view, image)?.id).toBe(1);
  });

  it('when nothing is under the pointer, then there is no hit', () => {
    expect(hitTest([under, over], imageToStage(p(0.9, 0.9), view, image), view, image)).toBeNull();
    expect(hitTest([], stagePoint(0, 0), view, image)).toBeNull();
  });

  it('when a tolerance is given, then it replaces the default 10 px', () => {
    const at = offStage(p(0.5, 0.3), view, 1, 0, 15);
    expect(hitTest([under], at, view, image)).toBeNull();
    expect(hitTest([under], at, view, image, 20)?.id).toBe(1);
  });

  it('when 1,000 findings are on the photo, then a hit test finishes quickly (time reported, budget ~5 ms)', () => {
    let seed = 42;
    const random = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
    const shapes = ['pin', 'circle', 'rect', 'arrow', 'freehand'] as const;
    const items: MarkupItem[] = Array.from({ length: 1000 }, (_, id) => {
      const shape = shapes[id % shapes.length] ?? 'pin';
      const x = random() * 0.9;
      const y = random() * 0.9;
      const count = shape === 'pin' ? 1 : shape === 'freehand' ? 200 : 2;
      const points = Array.from({ length: count }, (_, i) =>
        i === 0 ? p(x, y) : p(x + random() * 0.1, y + random() * 0.1),
      );
      return { id, shape, points };
    });
    const probes = Array.from({ length: 200 }, () => stagePoint(random() * 1000, random() * 800));
    const started = performance.now();
    const found = probes.map((at) => hitTest(items, at, view, image));
    const perTest = (performance.now() - started) / probes.length;
    console.info(`hitTest over 1,000 findings: ${perTest.toFixed(3)} ms per call (mean of ${probes.length})`);
    expect(found).toHaveLength(probes.length);
    expect(found.some((f) => f !== null)).toBe(true);
  });
});

describe('hitHandle and grabAt', () => {
  const view: ViewTransform = { scale: 2, x: 0, y: 0 };
  const box: MarkupItem = { id: 7, shape: 'rect', points: [p(0.2, 0.2), p(0.4, 0.4)] };
  const onTop: MarkupItem = { id: 8, shape: 'pin', points: [p(0.4, 0.4)] };

  it('when the pointer is near a corner of a rect, then that handle is found', () => {
    expect(hitHandle(box, offStage(p(0.4, 0.2), view, 1, 0, 6), view, image)).toBe('top-right');
    expect(hitHandle(box, offStage(p(0.3, 0.3), view, 0, 0, 0), view, image)).toBeNull();
  });

  it('when the selected finding’s handle lies under another finding, then the handle wins', () => {
    const at = imageToStage(p(0.4, 0.4), view, image);
    expect(grabAt([box, onTop], 7, at, view, image)).toEqual({ kind: 'handle', item: box, handle: 'bottom-right' });
  });

  it('when nothing is selected, then the topmost finding is grabbed by its body', () => {
    const at = imageToStage(p(0.4, 0.4), view, image);
    expect(grabAt([box, onTop], null, at, view, image)).toEqual({ kind: 'body', item: onTop });
  });

  it('when the pointer is over empty photo, then nothing is grabbed', () => {
    expect(grabAt([box, onTop], 7, imageToStage(p(0.9, 0.1), view, image), view, image)).toBeNull();
  });
});
