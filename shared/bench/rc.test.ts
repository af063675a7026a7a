import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { dischargeTime, rcCorner, storedEnergy, timeConstant } from './index';
import { expectRelative } from './bench-test-support';

// Formulas f = 1/(2πRC), τ = RC, t = RC·ln(V₀/V), E = ½CV²; reference values from mathjs.

describe('rcCorner', () => {
  it('puts 4.7 kΩ with 47 nF at about 720 Hz', () => {
    expectRelative(rcCorner(4.7e3, 47e-9), math.evaluate('1/(2*pi*4.7e3*47e-9)') as number); // mathjs
    expectRelative(rcCorner(4.7e3, 47e-9), 720, 0.001); // textbook passive low-pass worked example, 4k7 and 47 nF: 720 Hz (from memory)
  });

  it('puts 1 kΩ with 1 µF at 159 Hz, the textbook example', () => {
    expectRelative(rcCorner(1e3, 1e-6), 159.15, 1e-4); // textbook worked example: 1/(2π·1 ms) = 159.15 Hz
  });

  it('refuses a negative resistance', () => {
    expect(() => rcCorner(-15e3, 3.3e-9)).toThrow(/resistance \(Ω\) must be a number above zero/); // Gridleak's own message (not a computation)
  });
});

describe('timeConstant and dischargeTime', () => {
  it('gives 0.5 s for 10 kΩ and 50 µF', () => {
    expectRelative(timeConstant(10e3, 50e-6), math.evaluate('10e3 * 50e-6') as number); // mathjs
  });

  it('takes one time constant to fall to 36.8 % and about five to fall below 1 %', () => {
    // textbook RC discharge: after one τ the voltage is 36.8 % of the start; after 5τ, 0.67 %
    expectRelative(dischargeTime(47e-6, 10e3, 350, 350 * 0.368), 0.47, 0.001); // τ = 10 kΩ × 47 µF = 0.47 s, by hand
    expectRelative(dischargeTime(47e-6, 10e3, 350, 350 * 0.0067), 5 * 0.47, 0.002); // 5τ, by hand
    expectRelative(dischargeTime(47e-6, 10e3, 350, 50), math.evaluate('10e3 * 47e-6 * log(350/50)') as number); // mathjs
  });

  it('refuses to discharge to 0 V, which never quite happens', () => {
    expect(() => dischargeTime(50e-6, 10e3, 300, 0)).toThrow(/never quite reaches 0 V/); // exponential decay
  });

  it('refuses a target above the start', () => {
    expect(() => dischargeTime(50e-6, 10e3, 50, 300)).toThrow(/must be nearer zero/); // exponential decay
  });
});

describe('storedEnergy', () => {
  it('gives ½CV² for a 50 µF reservoir at 350 V', () => {
    expectRelative(storedEnergy(50e-6, 350), math.evaluate('0.5 * 50e-6 * 350^2') as number); // mathjs: 3.06 J
  });

  it('is the same for a negative rail', () => {
    expect(storedEnergy(50e-6, -350)).toBe(storedEnergy(50e-6, 350)); // E = ½CV² depends on V²
  });
});
