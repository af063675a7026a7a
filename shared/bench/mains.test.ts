import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { seriesLampLimit, seriesLampLimitDetail, tapScaled } from './index';
import { expectRelative } from './bench-test-support';

// Ideal transformer V = Vrated·Vmains/Vtap; lamp R_hot = V²/P, I = V/R (mathjs for the arithmetic).

describe('tapScaled', () => {
  it('gives 287.5 V from a 250 V winding on the 200 V tap fed 230 V', () => {
    const volts = tapScaled({ ratedVolts: 250, tapVolts: 200, mainsVolts: 230 });
    expectRelative(volts, math.evaluate('250 * 230 / 200') as number); // mathjs: ideal transformer ratio
    expectRelative(volts, 287.5); // by hand
  });

  it('lifts a 6.3 V heater to about 6.85 V on 240 V mains at the 220 V tap', () => {
    // a maker's bucking-transformer article measured 6.85 V heaters at 240 V on a 220 V set
    expectRelative(tapScaled({ ratedVolts: 6.3, tapVolts: 220, mainsVolts: 240 }), 6.85, 0.01);
  });

  it('refuses a zero tap', () => {
    expect(() => tapScaled({ ratedVolts: 200, tapVolts: 0, mainsVolts: 240 })).toThrow(
      /tap voltage \(V\) must be a number above zero/,
    ); // Gridleak's own message (not a computation)
  });
});

describe('seriesLampLimit', () => {
  it('gives a 100 W 120 V lamp 144 Ω hot and about 9.5 Ω cold', () => {
    const lamp = seriesLampLimitDetail({ lampWatts: 100, lampVolts: 120, mainsVolts: 120 });
    expectRelative(lamp.hotOhms, 144); // incandescent-lamp encyclopedia article: 100 W 120 V, 144 Ω hot
    expectRelative(lamp.coldOhms, 9.5, 0.02); // same article: about 9.5 Ω cold
  });

  it('lets at most P/V through when the set is a dead short', () => {
    expectRelative(
      seriesLampLimit({ lampWatts: 100, lampVolts: 120, mainsVolts: 120 }),
      math.evaluate('100/120') as number,
    ); // mathjs
    expectRelative(
      seriesLampLimit({ lampWatts: 60, lampVolts: 230, mainsVolts: 230 }),
      math.evaluate('60/230') as number,
    ); // mathjs
  });

  it('warns when the lamp is rated for lower mains', () => {
    expect(seriesLampLimitDetail({ lampWatts: 100, lampVolts: 120, mainsVolts: 230 }).note).toMatch(/overrun/); // lamp rated 120 V: common practice
  });
});
