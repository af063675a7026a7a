import { describe, expect, it } from 'vitest';
import { markerOutline, outlinePath } from './marker-outline';

describe('markerOutline', () => {
  it('when the severity is a hazard, then the marker is a triangle pointing up', () => {
    const outline = markerOutline('triangle', 10);
    expect(outline.kind).toBe('polygon');
    if (outline.kind !== 'polygon') return;
    expect(outline.points).toHaveLength(3);
    const [apex, ...base] = outline.points;
    expect(apex?.[0]).toBeCloseTo(0);
    expect(apex?.[1]).toBeLessThan(0);
    for (const p of base) expect(p[1]).toBeGreaterThan(0);
  });

  it('when the shapes are square and diamond, then a square has level sides and a diamond stands on a corner', () => {
    const square = markerOutline('square', 10);
    const diamond = markerOutline('diamond', 10);
    if (square.kind !== 'polygon' || diamond.kind !== 'polygon') throw new Error('polygons expected');
    const halfSides = new Set(square.points.flatMap(([x, y]) => [Math.abs(x), Math.abs(y)]));
    expect(halfSides.size).toBe(1);
    expect([...halfSides][0]).toBeCloseTo(9, 1);
    expect(diamond.points.some(([x, y]) => x === 0 && y < 0)).toBe(true);
  });

  it('when the shape is a circle or a ring, then the outline is a circle of the given radius', () => {
    expect(markerOutline('circle', 14)).toEqual({ kind: 'circle', r: 14 });
    expect(markerOutline('ring', 14)).toEqual({ kind: 'circle', r: 14 });
  });

  it('when turned into an SVG path, then it starts with a move, visits every corner and closes', () => {
    expect(
      outlinePath(
        {
          kind: 'polygon',
          points: [
            [0, -1],
            [1, 1],
            [-1, 1],
          ],
        },
        10,
        10,
      ),
    ).toBe('M 10 9 L 11 11 L 9 11 Z');
    expect(outlinePath({ kind: 'circle', r: 2 }, 0, 0)).toBe('M -2 0 A 2 2 0 1 0 2 0 A 2 2 0 1 0 -2 0 Z');
  });
});
