import { describe, expect, it } from 'vitest';
import { measurementVerdict } from './measurement-verdict';
import { parseTolerance } from './tolerance-text';

describe('measurementVerdict', () => {
  it('when a healthy 50 µF 400 V filter electrolytic reads 0.5 Ω ESR, then it is within the ~0.8 Ω expected maximum', () => {
    // Fact of the trade (issue brief; BENCH-REFERENCE §4 Table A, 250 V column used above 250 V): common practice, no source.
    const v = measurementVerdict({ quantity: 'esr', expected: '50µ', rating: '400 V', reading: '0.5 Ω' });
    expect(v.verdict).toBe('within');
    expect(v.reference).toBeCloseTo(0.8, 1);
    expect(v.reason).toMatch(/extrapolated/);
  });

  it('when the same part reads 1.2 Ω, then it is marginal; at 2 Ω it is out', () => {
    // Table A's accompanying advice: "be wary of a capacitor reading more than double" (BENCH-REFERENCE §4).
    expect(measurementVerdict({ quantity: 'esr', expected: '50µ', rating: '400', reading: '1.2' }).verdict).toBe('marginal');
    expect(measurementVerdict({ quantity: 'esr', expected: '50µ', rating: '400', reading: '2' }).verdict).toBe('out');
  });

  it('when a 22 µF 25 V part leaks 4 µA, then the datasheet rule (0.01·C·V or 3 µA → 5.5 µA) passes it', () => {
    // General-purpose radial datasheet rule, as stated in BENCH-REFERENCE §3: 0.01 × 22 × 25 = 5.5 µA.
    const v = measurementVerdict({ quantity: 'leakage', expected: '22u', rating: '25V', reading: '4u' });
    expect(v.verdict).toBe('within');
    expect(v.reference).toBeCloseTo(5.5e-6, 12);
  });

  it('when an anode reads 280 V against the manual’s 215 V with no tolerance given, then ±20 % makes it out (+30.2 %)', () => {
    // Worked log from the trade primer: "V7 Va=280 (215)"; ±20 % is the usual allowance (common practice, no source).
    const v = measurementVerdict({ quantity: 'dc-voltage', expected: '215', reading: '280 V' });
    expect(v.verdict).toBe('out');
    expect(v.deviation).toBeCloseTo(65 / 215, 12);
    expect(v.reason).toMatch(/\+30\.2 %/);
  });

  it('when a 4k7 resistor reads 5.3 kΩ with ±10 %, then it is marginal (+12.8 %, within 1.5 × the band)', () => {
    // Arithmetic: (5300 − 4700) / 4700 = 0.1277; library rule: marginal up to 1.5 × tolerance.
    expect(measurementVerdict({ quantity: 'resistance', expected: '4k7', tolerance: '10', reading: '5k3' }).verdict).toBe('marginal');
  });

  it('when insulation reads 0.4 MΩ with no minimum given, then it fails the 1 MΩ Class I minimum', () => {
    // In-service inspection code of practice (IET), as quoted in BENCH-REFERENCE §10: ≥ 1 MΩ at 500 V DC for Class I.
    expect(measurementVerdict({ quantity: 'insulation', reading: '400k' }).verdict).toBe('out');
    expect(measurementVerdict({ quantity: 'insulation', expected: '2M', reading: '5M' }).verdict).toBe('within');
  });

  it('when nothing is expected, then the verdict is unknown with a reason', () => {
    expect(measurementVerdict({ quantity: 'current', reading: '62 mA' })).toMatchObject({ verdict: 'unknown', reason: 'No expected value to compare with.' });
  });

  it('when values are unparseable, in the wrong unit or negative, then the error says which field', () => {
    expect(() => measurementVerdict({ quantity: 'resistance', expected: 'four k', reading: '4k7' })).toThrow(/^Expected value:/);
    expect(() => measurementVerdict({ quantity: 'resistance', expected: '4k7', reading: '250 V' })).toThrow(/^Reading:/);
    expect(() => measurementVerdict({ quantity: 'capacitance', expected: '47u', reading: '-47u' })).toThrow(/cannot be negative/);
  });
});

describe('parseTolerance', () => {
  it('when written as per cent, then it becomes fractions', () => {
    // Electrolytic marking −20 %/+50 % (IEC 60062 letter S, BENCH-REFERENCE §1e).
    expect(parseTolerance('±10 %')).toBe(0.1);
    expect(parseTolerance('-20/+50')).toEqual({ minus: 0.2, plus: 0.5 });
    expect(() => parseTolerance('ten')).toThrow(/per cent/);
  });
});
