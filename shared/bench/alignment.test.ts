import { describe, expect, it } from 'vitest';
import { frequencyOf, frequencyTolerance, IF_PRESETS, wavelengthOf } from './index';
import { expectRelative } from './bench-test-support';

// Dial scales: λ[m] = 300,000 / f[kHz] (c rounded to 3 × 10⁸ m/s; any radio textbook); expected values by hand.

describe('wavelengthOf and frequencyOf', () => {
  it('when the dial says 1,000 kHz, then it is 300 m', () => {
    expectRelative(wavelengthOf(1e6), 300); // by hand: 300,000 / 1,000
  });

  it('when a long-wave dial says 1,500 m, then it is 200 kHz', () => {
    expectRelative(frequencyOf(1500), 200e3); // by hand: 300,000 / 1,500
  });

  it('when a medium-wave dial says 200 m, then it is 1,500 kHz', () => {
    expectRelative(frequencyOf(200), 1.5e6); // by hand
  });

  it('when the FM IF is 10.7 MHz, then it is about 28 m', () => {
    expectRelative(wavelengthOf(10.7e6), 28.0374, 1e-5); // by hand: 300 / 10.7
  });

  it('refuses zero', () => {
    expect(() => wavelengthOf(0)).toThrow(/frequency \(Hz\) must be a number above zero/); // Gridleak's own message (not a computation)
  });
});

describe('IF presets', () => {
  it('when listed, then they are the usual broadcast IFs', () => {
    // common practice, no source: AM IFs of 455–472 kHz and the FM IF of 10.7 MHz
    expect(IF_PRESETS.map((p) => p.hertz)).toEqual([455e3, 465e3, 468e3, 470e3, 472e3, 10.7e6]);
  });

  it('when an IF is AM or FM, then the tolerance is absolute: ±2 kHz or ±25 kHz', () => {
    expect(frequencyTolerance(470e3)).toBe(2e3); // common practice, no source
    expect(frequencyTolerance(10.7e6)).toBe(25e3); // common practice, no source
  });
});
