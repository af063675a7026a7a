import { describe, expect, it } from 'vitest';
import { partWarnings, readRating } from './part-rules';

describe('partWarnings', () => {
  it('when a 350 V capacitor replaces a 450 V one, then it is flagged as dangerous', () => {
    // Trade rule "never lower the voltage rating": common practice, no source.
    const w = partWarnings({ original: '32 µF 450 V', replacement: '33 µF 350 V' });
    expect(w).toEqual([
      expect.objectContaining({ level: 'danger', message: expect.stringMatching(/350 V, below the original's 450 V/) }),
    ]);
  });

  it('when 47 µF 450 V replaces 50 µF 350 V, then it is accepted', () => {
    // −6 % is inside the electrolytic tolerance −20 %/+50 % (IEC 60062 letter S); the voltage rises.
    expect(partWarnings({ original: '50µF 350V', replacement: '47µF 450V' })).toEqual([]);
  });

  it('when an electrolytic is far off the original value, then it is a caution', () => {
    // 100 µF for 32 µF is +213 %, beyond +50 % (IEC 60062 letter S band, common practice for reservoirs).
    expect(partWarnings({ original: '32µF 450V', replacement: '100µF 450V' })[0]).toMatchObject({ level: 'caution' });
  });

  it('when a capacitor on the mains is not safety-rated, then it is flagged; X2 in a Y position too', () => {
    // IEC 60384-14 classes: X across the line, Y line to chassis; "Y2 may replace X2, never X2 in a Y position" (IEC 60384-14 via a maker's X/Y subclass table and the IEEE EMC Society product-safety list).
    expect(
      partWarnings({ original: '0.01µF 750V', replacement: '10nF 630V film', mainsPosition: 'across-line' })[0]!.level,
    ).toBe('danger');
    expect(
      partWarnings({ original: '0.01µF 750V', replacement: '10nF X2 275V', mainsPosition: 'across-line' }),
    ).toEqual([]);
    expect(
      partWarnings({ original: '4n7', replacement: '4.7nF X2 275V', mainsPosition: 'line-to-chassis' })[0]!.message,
    ).toMatch(/not X2/);
    expect(partWarnings({ original: '4n7', replacement: '4.7nF Y2 300V', mainsPosition: 'line-to-chassis' })).toEqual(
      [],
    );
  });

  it('when ratings are written in several styles, then the values are read', () => {
    // Value notation of the era: common practice, no source.
    expect(readRating('0.05 µF 400 V paper')).toEqual({ farads: 0.05e-6, volts: 400 });
    expect(readRating('32u/450V')).toEqual({ farads: 32e-6, volts: 450 });
  });
});
