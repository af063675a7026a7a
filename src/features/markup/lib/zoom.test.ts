import { describe, expect, it } from 'vitest';
import { formatZoom, wheelZoomFactor } from './zoom';

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

  it('when one event is huge, then the step is held to ×2 or ÷2', () => {
    expect(wheelZoomFactor(-100_000, 0, false)).toBe(2);
    expect(wheelZoomFactor(100_000, 0, false)).toBe(0.5);
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
