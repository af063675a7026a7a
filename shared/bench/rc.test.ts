import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { dischargeTime, rcCorner, storedEnergy, timeConstant } from './index';
import { expectRelative } from './bench-test-support';

// Formulas f = 1/(2πRC), τ = RC, t = RC·ln(V₀/V), E = ½CV²; reference values from mathjs.

describe('rcCorner', () => {
  it('puts 15 kΩ with 3.3 nF at about 3.2 kHz', () => {
    expectRelative(rcCorner(15e3, 3.3e-9), math.evaluate('1/(2*pi*15e3*3.3e-9)') as number); // mathjs
    expectRelative(rcCorner(15e3, 3.3e-9), 3.2e3, 0.01); // common practice, no source: "about 3.2 kHz"
  });

  it('puts 1 kΩ with 1 µF at 159 Hz, the textbook example', () => {
    expectRelative(rcCorner(1e3, 1e-6), 159.15, 1e-4); // textbook worked example: 1/(2π·1 ms) = 159.15 Hz
  });

  it('refuses a negative resistance', () => {
    expect(() => rcCorner(-15e3, 3.3e-9)).toThrow(/resistance \(Ω\) must be a number above zero/); // product rule
  });
});

describe('timeConstant and dischargeTime', () => {
  it('gives 0.5 s for 10 kΩ and 50 µF', () => {
    expectRelative(timeConstant(10e3, 50e-6), math.evaluate('10e3 * 50e-6') as number); // mathjs
  });

  it('takes about 0.9 s to bring 50 µF from 300 V to 50 V through 10 kΩ', () => {
    const seconds = dischargeTime(50e-6, 10e3, 300, 50);
    expectRelative(seconds, math.evaluate('10e3 * 50e-6 * log(300/50)') as number); // mathjs
    expectRelative(seconds, 0.9, 0.01); // common practice, no source: BENCH-REFERENCE §10 "300 V → 50 V in 0.9 s"
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
