import { describe, expect, it } from 'vitest';
import { closeupRegion } from './closeup-region';

// Product geometry (no outside source): expected regions worked by hand.
describe('closeupRegion', () => {
  it('when a pin sits mid-image, then a minimum-size square centres on it', () => {
    expect(closeupRegion('pin', [{ x: 0.5, y: 0.5 }], { width: 2400, height: 1600 })).toEqual({
      left: 1040,
      top: 640,
      width: 320,
      height: 320,
    });
  });

  it('when a circle is large, then the square covers its disc and half again', () => {
    // Centre (1200, 800), rim 0.05 × 2400 = 120 px away: disc 240 px across, ×1.5 = 360.
    expect(
      closeupRegion(
        'circle',
        [
          { x: 0.5, y: 0.5 },
          { x: 0.55, y: 0.5 },
        ],
        { width: 2400, height: 1600 },
      ),
    ).toEqual({ left: 1020, top: 620, width: 360, height: 360 });
  });

  it('when the mark is at a corner, then the region stays inside the image', () => {
    const r = closeupRegion(
      'rect',
      [
        { x: 0, y: 0 },
        { x: 0.02, y: 0.02 },
      ],
      { width: 1000, height: 800 },
    );
    expect(r).toEqual({ left: 0, top: 0, width: 320, height: 320 });
  });
});
