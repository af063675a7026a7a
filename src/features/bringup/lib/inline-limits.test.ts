import { describe, expect, it } from 'vitest';
import { lampLimitWords, tapWords } from './inline-limits';

describe('lampLimitWords', () => {
  it('when a 60 W 230 V lamp is on 230 V, then it says at most 0.26 A', () => {
    // Worked by hand: I = P/V = 60 / 230 = 0.2609 A (lamp alone across the mains; PHYS, P = VI).
    expect(lampLimitWords({ lampWatts: 60, lampVolts: 230, appliedVolts: 230 })?.limit).toMatch(
      /at most 0\.26 A at 230 V/,
    );
  });

  it('when a 100 W 120 V lamp is on 120 V, then it says at most 0.83 A', () => {
    // Incandescent-lamp encyclopedia article: 100 W 120 V lamp is 144 Ω hot; 120 / 144 = 0.833 A, worked by hand.
    expect(lampLimitWords({ lampWatts: 100, lampVolts: 120, appliedVolts: 120 })?.limit).toMatch(/at most 0\.83 A/);
  });

  it('when the lamp is rated well below the mains, then the note warns it is overrun', () => {
    // Common practice, no source: a lamp run far above its rating may fail.
    expect(lampLimitWords({ lampWatts: 100, lampVolts: 120, appliedVolts: 230 })?.note).toMatch(/overrun/);
  });

  it('when the rating is not known yet, then it says nothing', () => {
    expect(lampLimitWords({ lampWatts: null, lampVolts: 230, appliedVolts: 230 })).toBeNull();
  });
});

describe('tapWords', () => {
  it('when a 6.3 V heater winding on the 220 V tap sees 240 V, then it gives about 6.87 V, +9.1 %', () => {
    // Ideal transformer, worked by hand: 6.3 × 240 / 220 = 6.873 V; a maker's bucking-transformer article
    // measured 6.85 V heaters in this case, which agrees within 0.4 %.
    expect(tapWords({ ratedVolts: 6.3, tapVolts: 220, mainsVolts: 240 })).toBe(
      'A 6.3 V winding gives about 6.87 V on the 220 V tap at 240 V mains (+9.1 %).',
    );
  });

  it('when the tap matches the mains, then the winding gives its rating', () => {
    // Ideal transformer: V_sec = V_rated when V_mains = V_tap (definition of the rating).
    expect(tapWords({ ratedVolts: 250, tapVolts: 230, mainsVolts: 230 })).toMatch(/about 250\.00 V .*\(as rated\)/);
  });

  it('when the mains is below the tap, then it says how far the winding falls', () => {
    // Worked by hand: 250 × 220 / 240 = 229.17 V, −8.3 %.
    expect(tapWords({ ratedVolts: 250, tapVolts: 240, mainsVolts: 220 })).toMatch(/about 229\.17 V .*\(\u22128\.3 %\)/);
  });
});
