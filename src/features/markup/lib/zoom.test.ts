import { describe, expect, it } from 'vitest';
import { formatZoom, MAX_WHEEL_STEP, wheelZoomFactor } from './zoom';

describe('wheelZoomFactor', () => {
  it('when the wheel turns up (negative delta), then it zooms in, and down zooms out by the inverse', () => {
    const up = wheelZoomFactor(-100, 0, false);
    expect(up).toBeGreaterThan(1);
    expect(wheelZoomFactor(100, 0, false)).toBeCloseTo(1 / up, 12);
  });

  it('when the delta is in lines, then it counts as 16 px a line', () => {
    expect(wheelZoomFactor(-3, 1, false)).toBeCloseTo(wheelZoomFactor(-48, 0, false), 12);
  });

  it('when a trackpad pinch sends Ctrl with the wheel, then the same delta zooms further', () => {
    expect(wheelZoomFactor(-10, 0, true)).toBeGreaterThan(wheelZoomFactor(-10, 0, false));
  });

  it('when one event is huge, then the step is held to ×1.2 or ÷1.2', () => {
    expect(wheelZoomFactor(-100_000, 0, false)).toBe(MAX_WHEEL_STEP);
    expect(wheelZoomFactor(100_000, 0, false)).toBe(1 / MAX_WHEEL_STEP);
    expect(MAX_WHEEL_STEP).toBe(1.2);
  });

  it('when five mouse notches turn up from Fit (19 %), then the zoom stays below 50 %, not 800 %', () => {
    for (const [delta, mode] of [
      [-100, 0],
      [-120, 0],
      [-3, 1],
      [-1, 2],
    ] as const) {
      let scale = 0.19;
      for (let i = 0; i < 5; i++) scale *= wheelZoomFactor(delta, mode, false);
      expect(scale).toBeLessThan(0.5);
      expect(scale).toBeGreaterThan(0.19 * 1.3);
    }
  });
});

describe('formatZoom', () => {
  it('when the scale is a fraction, then it reads as a whole percentage', () => {
    expect(formatZoom(1)).toBe('100\u00a0%');
    expect(formatZoom(0.18933)).toBe('19\u00a0%');
    expect(formatZoom(8)).toBe('800\u00a0%');
    expect(formatZoom(0.004)).toBe('<1\u00a0%');
  });
});
