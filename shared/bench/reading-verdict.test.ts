import { describe, expect, it } from 'vitest';
import { readingVerdict } from './index';
import { expectRelative } from './bench-test-support';

// Tolerances from IEC 60062 letters (J ±5 %, K ±10 %, S −20/+50 %); 'marginal' is Gridleak's own band
// from 1× to 1.5× the tolerance, so each case sits clearly inside one region.

describe('readingVerdict', () => {
  it('calls a 4.7 kΩ ±5 % part reading exactly 5 % high within', () => {
    const result = readingVerdict({ expected: 4700, reading: 4935, tolerance: 0.05 }); // IEC 60062: gold/J = ±5 %
    expect(result.verdict).toBe('within');
    expectRelative(result.deviation, 0.05); // (4935 − 4700)/4700
  });

  it('calls a ±10 % part reading 12 % high marginal', () => {
    expect(readingVerdict({ expected: 100e3, reading: 112e3, tolerance: 0.1 }).verdict).toBe('marginal'); // IEC 60062: K = ±10 %
  });

  it('calls a ±10 % part reading 20 % high out', () => {
    expect(readingVerdict({ expected: 100e3, reading: 120e3, tolerance: 0.1 }).verdict).toBe('out'); // IEC 60062: K = ±10 %
  });

  it('calls a ±10 % part reading 22 % low out', () => {
    expect(readingVerdict({ expected: 100e3, reading: 78e3, tolerance: 0.1 }).verdict).toBe('out'); // IEC 60062: K = ±10 %
  });

  it('applies an asymmetric electrolytic tolerance', () => {
    const tolerance = { minus: 0.2, plus: 0.5 }; // IEC 60062 letter S: −20 % / +50 %
    expect(readingVerdict({ expected: 50e-6, reading: 70e-6, tolerance }).verdict).toBe('within'); // +40 %
    expect(readingVerdict({ expected: 50e-6, reading: 37.5e-6, tolerance }).verdict).toBe('marginal'); // −25 %
  });

  it('reads a negative bias by magnitude', () => {
    // from memory: EL84 Vg1 −7.3 V; a reading of −8 V is 9.6 % larger in magnitude
    const result = readingVerdict({ expected: -7.3, reading: -8, tolerance: 0.1 });
    expect(result.verdict).toBe('within');
    expect(result.deviation).toBeGreaterThan(0);
  });

  it('refuses an expected value of zero', () => {
    expect(() => readingVerdict({ expected: 0, reading: 1, tolerance: 0.1 })).toThrow(/expected value is 0/); // Gridleak's own message (not a computation)
  });

  it('refuses a tolerance written as a percentage', () => {
    expect(() => readingVerdict({ expected: 100, reading: 100, tolerance: 10 })).toThrow(/±10 % is 0\.1/); // Gridleak's own message (not a computation)
  });
});
