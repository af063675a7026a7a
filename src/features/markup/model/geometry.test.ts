import { describe, expect, it } from 'vitest';
import { imagePoint as p, type ImagePoint } from './coordinates';
import {
  anchor,
  bounds,
  circleRadius,
  handles,
  resize,
  simplifyFreehand,
  toGeometry,
  translate,
  type Geometry,
} from './geometry';
import { MAX_FREEHAND_POINTS } from './simplify-freehand';

const square = { width: 1000, height: 1000 };
const threeByTwo = { width: 300, height: 200 };

const pin: Geometry = { shape: 'pin', points: [p(0.3, 0.4)] };
const circle: Geometry = { shape: 'circle', points: [p(0.5, 0.5), p(0.6, 0.5)] };
const rect: Geometry = { shape: 'rect', points: [p(0.7, 0.2), p(0.4, 0.6)] }; // drawn from the top-right corner
const arrow: Geometry = { shape: 'arrow', points: [p(0.8, 0.9), p(0.6, 0.7)] };
const freehand: Geometry = { shape: 'freehand', points: [p(0.2, 0.2), p(0.1, 0.3), p(0.25, 0.35)] };

function expectPoints(actual: readonly ImagePoint[], expected: readonly (readonly [number, number])[]) {
  expect(actual).toHaveLength(expected.length);
  actual.forEach((q, i) => {
    expect(q.x).toBeCloseTo(expected[i]?.[0] ?? NaN, 12);
    expect(q.y).toBeCloseTo(expected[i]?.[1] ?? NaN, 12);
  });
}

describe('circleRadius', () => {
  it('when a circle on a 3:2 photo has its rim straight below the centre, then the radius counts image px down', () => {
    // 0.3 of 200 px high = 60 px, although the normalised distance is 0.3.
    expect(circleRadius({ shape: 'circle', points: [p(0.5, 0.5), p(0.5, 0.8)] }, threeByTwo)).toBeCloseTo(60, 12);
  });

  it('when the rim is straight across on the 3:2 photo, then 0.2 of 300 px is the same 60 px radius', () => {
    expect(circleRadius({ shape: 'circle', points: [p(0.5, 0.5), p(0.7, 0.5)] }, threeByTwo)).toBeCloseTo(60, 12);
  });

  it('when the rim is diagonal on the 3:2 photo, then the radius is the hypotenuse in image px', () => {
    // dx = 0.1 × 300 = 30 px, dy = 0.2 × 200 = 40 px → 50 px.
    expect(circleRadius({ shape: 'circle', points: [p(0.5, 0.5), p(0.6, 0.7)] }, threeByTwo)).toBeCloseTo(50, 12);
  });
});

describe('bounds', () => {
  it('when the mark is a pin, then its bounds are its point', () => {
    expect(bounds(pin, square)).toEqual({ minX: 0.3, minY: 0.4, maxX: 0.3, maxY: 0.4 });
  });

  it('when the mark is a circle on a 3:2 photo, then its box is wider in px but narrower in normalised x', () => {
    // Radius 60 px: ±60/300 = ±0.2 across, ±60/200 = ±0.3 down.
    const b = bounds({ shape: 'circle', points: [p(0.5, 0.5), p(0.5, 0.8)] }, threeByTwo);
    expect(b.minX).toBeCloseTo(0.3, 12);
    expect(b.maxX).toBeCloseTo(0.7, 12);
    expect(b.minY).toBeCloseTo(0.2, 12);
    expect(b.maxY).toBeCloseTo(0.8, 12);
  });

  it.each([
    ['rect', rect, { minX: 0.4, minY: 0.2, maxX: 0.7, maxY: 0.6 }],
    ['arrow', arrow, { minX: 0.6, minY: 0.7, maxX: 0.8, maxY: 0.9 }],
    ['freehand', freehand, { minX: 0.1, minY: 0.2, maxX: 0.25, maxY: 0.35 }],
  ])('when the mark is a %s, then its bounds enclose its points', (_shape, g, expected) => {
    expect(bounds(g, square)).toEqual(expected);
  });
});

describe('anchor', () => {
  it.each([
    ['a pin, then the label sits on its point', pin, [0.3, 0.4]],
    ['a circle, then on its centre', circle, [0.5, 0.5]],
    ['a rect drawn from any corner, then on its top-left corner', rect, [0.4, 0.2]],
    ['an arrow, then on its tail', arrow, [0.8, 0.9]],
    ['a freehand stroke, then on its first point', freehand, [0.2, 0.2]],
  ] as const)('when the mark is %s', (_name, g, [x, y]) => {
    expect(anchor(g)).toEqual({ x, y });
  });
});

describe('translate', () => {
  it('when moved within the photo, then every point moves by the delta', () => {
    expectPoints(translate(arrow, -0.1, 0.05).points, [
      [0.7, 0.95],
      [0.5, 0.75],
    ]);
  });

  it.each([
    ['a pin pushed past the left edge', pin, -0.9, 0, [[0, 0.4]]],
    [
      'a circle pushed past the right edge',
      circle,
      0.9,
      0,
      [
        [0.9, 0.5],
        [1, 0.5],
      ],
    ],
    [
      'a rect pushed past the top and left',
      rect,
      -1,
      -1,
      [
        [0.3, 0],
        [0, 0.4],
      ],
    ],
    [
      'an arrow pushed past the bottom',
      arrow,
      0,
      0.5,
      [
        [0.8, 1],
        [0.6, 0.8],
      ],
    ],
    [
      'a freehand stroke pushed past the top-left',
      freehand,
      -0.5,
      -0.5,
      [
        [0.1, 0],
        [0, 0.1],
        [0.15, 0.15],
      ],
    ],
  ] as const)('when %s, then it stops at the edge with its shape intact', (_name, g, dx, dy, expected) => {
    expectPoints(translate(g, dx, dy).points, expected);
  });
});

describe('resize', () => {
  it('when the circle’s rim is dragged, then the centre stays and the rim follows', () => {
    expectPoints(resize(circle, 'rim', p(0.5, 0.9)).points, [
      [0.5, 0.5],
      [0.5, 0.9],
    ]);
  });

  it.each([
    [
      'top-left',
      [0.3, 0.1],
      [
        [0.3, 0.1],
        [0.7, 0.6],
      ],
    ],
    [
      'top-right',
      [0.9, 0.1],
      [
        [0.4, 0.1],
        [0.9, 0.6],
      ],
    ],
    [
      'bottom-left',
      [0.3, 0.8],
      [
        [0.3, 0.2],
        [0.7, 0.8],
      ],
    ],
    [
      'bottom-right',
      [0.9, 0.8],
      [
        [0.4, 0.2],
        [0.9, 0.8],
      ],
    ],
  ] as const)('when the rect’s %s corner is dragged, then the opposite corner stays', (handle, [x, y], expected) => {
    expectPoints(resize(rect, handle, p(x, y)).points, expected);
  });

  it('when a rect corner is dragged past the opposite corner, then the rect flips instead of inverting', () => {
    expectPoints(resize(rect, 'top-left', p(0.9, 0.9)).points, [
      [0.7, 0.6],
      [0.9, 0.9],
    ]);
  });

  it('when either end of an arrow is dragged, then only that end moves', () => {
    expectPoints(resize(arrow, 'start', p(0.1, 0.1)).points, [
      [0.1, 0.1],
      [0.6, 0.7],
    ]);
    expectPoints(resize(arrow, 'end', p(0.2, 0.3)).points, [
      [0.8, 0.9],
      [0.2, 0.3],
    ]);
  });

  it('when a handle is dragged off the photo, then it stops at the edge', () => {
    expectPoints(resize(circle, 'rim', p(1.4, -0.2)).points, [
      [0.5, 0.5],
      [1, 0],
    ]);
  });

  it('when the shape has no such handle, then the mark is unchanged', () => {
    expect(resize(pin, 'rim', p(0.1, 0.1))).toBe(pin);
    expect(resize(freehand, 'end', p(0.1, 0.1))).toBe(freehand);
    expect(resize(circle, 'top-left', p(0.1, 0.1))).toBe(circle);
  });

  it('when a mark is selected, then its handles are the rim, the four corners or the two ends', () => {
    expect(handles(circle).map((h) => h.handle)).toEqual(['rim']);
    expect(handles(rect).map((h) => h.handle)).toEqual(['top-left', 'top-right', 'bottom-left', 'bottom-right']);
    expect(handles(arrow).map((h) => h.handle)).toEqual(['start', 'end']);
    expect(handles(pin)).toEqual([]);
  });
});

describe('simplifyFreehand', () => {
  // Ramer (1972) / Douglas & Peucker (1973). Expected values worked by hand on a 10×10 px photo, in image px:
  // P0 (0,0), P1 (2,0.5), P2 (4,0), P3 (6,3), P4 (8,0).
  // Chord P0–P4 lies on y = 0: P1 0.5, P2 0, P3 3 px away → P3 is farthest.
  // Chord P0–P3: distance |3x − 6y| / √45 → P1 3/√45 ≈ 0.447, P2 12/√45 ≈ 1.789 px.
  // Chord P0–P2: P1 0.5 px. P3–P4 has nothing between.
  const stroke = [p(0, 0), p(0.2, 0.05), p(0.4, 0), p(0.6, 0.3), p(0.8, 0)];
  const tenPx = { width: 10, height: 10 };

  it('when the tolerance is 1 px, then P2 (1.789 px off P0–P3) stays and P1 (0.5 px off P0–P2) goes', () => {
    expect(simplifyFreehand(stroke, 1, tenPx)).toEqual([stroke[0], stroke[2], stroke[3], stroke[4]]);
  });

  it('when the tolerance is 2 px, then P2 goes too and only P0, P3, P4 remain', () => {
    expect(simplifyFreehand(stroke, 2, tenPx)).toEqual([stroke[0], stroke[3], stroke[4]]);
  });

  it('when the same stroke is on a 20×20 px photo, then distances double (tolerance is image px): P2 at 3.58 px stays at 2 px', () => {
    expect(simplifyFreehand(stroke, 2, { width: 20, height: 20 })).toEqual([
      stroke[0],
      stroke[2],
      stroke[3],
      stroke[4],
    ]);
  });

  it('when the stroke has two points, then it is returned as it is', () => {
    expect(simplifyFreehand([p(0, 0), p(1, 1)], 5, square)).toEqual([p(0, 0), p(1, 1)]);
  });

  it('when a zigzag keeps more than 2000 points at the tolerance, then the tolerance grows until it fits', () => {
    const zigzag = Array.from({ length: 5000 }, (_, i) => p(i / 5000, i % 2 === 0 ? 0.4 : 0.4 + (i % 7) / 1000));
    const kept = simplifyFreehand(zigzag, 0, square);
    expect(kept.length).toBeLessThanOrEqual(MAX_FREEHAND_POINTS);
    expect(kept.length).toBeGreaterThanOrEqual(2);
    expect(kept[0]).toBe(zigzag[0]);
    expect(kept[kept.length - 1]).toBe(zigzag[zigzag.length - 1]);
  });
});

describe('toGeometry', () => {
  it('when a finding comes from the API, then its shape and points are kept', () => {
    expect(
      toGeometry({
        shape: 'arrow',
        points: [
          { x: 0.1, y: 0.2 },
          { x: 0.3, y: 0.4 },
        ],
      }),
    ).toEqual({
      shape: 'arrow',
      points: [
        { x: 0.1, y: 0.2 },
        { x: 0.3, y: 0.4 },
      ],
    });
  });
});
