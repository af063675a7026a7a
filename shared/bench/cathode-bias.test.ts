import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { bypassCorner, cathodeBias, cathodeCurrent } from './index';
import { expectRelative } from './bench-test-support';

// Vk = (Ia + Ig2)·Rk, P = Ik²·Rk, f = 1/(2π·Rk·Ck); mathjs for the arithmetic, valve data as noted.

describe('cathodeBias', () => {
  it('brings an EL84 to its −7.3 V (from memory) with screen current included', () => {
    // from memory: EL84 class A, Ia 48 mA, Ig2 5.5 mA, Rk 135 Ω, Vg1 −7.3 V (valve data handbook as recalled)
    const bias = cathodeBias({ cathodeOhms: 135, anodeAmps: 48e-3, screenAmps: 5.5e-3 });
    expectRelative(bias.biasVolts, 7.3, 0.02);
    expectRelative(bias.gridVolts, -7.3, 0.02); // data sheets write the grid negative
    expectRelative(bias.cathodeAmps, math.evaluate('48e-3 + 5.5e-3') as number); // mathjs: screen current returns via the cathode
    expectRelative(bias.resistorWatts, math.evaluate('(53.5e-3)^2 * 135') as number); // mathjs: Ik²·Rk
  });

  it('assumes no screen current for a triode', () => {
    // ECC83 per section: Ia 1.2 mA (encyclopedia, citing a maker's data sheet); on 1.5 kΩ that is 1.8 V, worked by hand
    const bias = cathodeBias({ cathodeOhms: 1.5e3, anodeAmps: 1.2e-3 });
    expectRelative(bias.biasVolts, 1.8);
    expectRelative(bias.cathodeAmps, 1.2e-3); // a triode has no screen: Ik = Ia
  });

  it('gives an ECL86 pentode about 7 V on 170 Ω', () => {
    // from memory: ECL86 Ia 36 mA, Ig2 6 mA, Rk 170 Ω; mathjs for (Ia+Ig2)·Rk
    expectRelative(
      cathodeBias({ cathodeOhms: 170, anodeAmps: 36e-3, screenAmps: 6e-3 }).biasVolts,
      math.evaluate('42e-3 * 170') as number,
    );
  });

  it('refuses a negative anode current', () => {
    expect(() => cathodeBias({ cathodeOhms: 135, anodeAmps: -0.048 })).toThrow(
      /anode current \(A\) must be zero or a positive number/,
    ); // Gridleak's own message (not a computation)
  });
});

describe('cathodeCurrent', () => {
  it('recovers an EL84\u2019s total current from 7.3 V across 135 Ω', () => {
    // from memory: EL84 Ia + Ig2 = 53.5 mA; Ohm's law
    expectRelative(cathodeCurrent({ cathodeVolts: 7.3, cathodeOhms: 135 }), 53.5e-3, 0.02);
  });
});

describe('bypassCorner', () => {
  it('puts 135 Ω with 50 µF near 24 Hz', () => {
    expectRelative(bypassCorner(135, 50e-6), math.evaluate('1/(2*pi*135*50e-6)') as number); // mathjs
  });
});
