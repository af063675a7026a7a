import { describe, expect, it } from 'vitest';
import { measurementVerdict } from './measurement-verdict';
import { parseTolerance } from './tolerance-text';
import { expectRelative } from './bench-test-support';

// Table A: the widely circulated worst-case ESR chart for new electrolytics, 100 kHz, 20 °C (glodark.com/design/esrchart.htm).

describe('measurementVerdict against a maximum', () => {
  it('when a 47 µF 450 V reservoir reads 0.6 Ω ESR, then it is within the 0.8 Ω of the 250 V column, flagged as extrapolated', () => {
    // Table A: 47 µF, 250 V = 0.8 Ω; the table stops at 250 V
    const v = measurementVerdict({ quantity: 'esr', expected: '47µ', rating: '450 V', reading: '0.6 Ω' });
    expect(v.verdict).toBe('within');
    expect(v.limit).toBe('maximum');
    expectRelative(v.reference!, 0.8);
    expect(v.reason).toMatch(/extrapolated/);
    expect(v.summary).toBe('600 mΩ, within the 800 mΩ maximum');
  });

  it('when the same part reads 1.3 Ω, then it is marginal; at 1.7 Ω it is out', () => {
    // Table A's accompanying advice: "be wary of a capacitor with an ESR reading more than double"
    expect(measurementVerdict({ quantity: 'esr', expected: '47µ', rating: '450', reading: '1.3' }).verdict).toBe(
      'marginal',
    );
    expect(measurementVerdict({ quantity: 'esr', expected: '47µ', rating: '450', reading: '1.7' }).verdict).toBe('out');
  });

  it('when a 4,700 µF 16 V part is judged, then the table row above 1,000 µF is used, not an extrapolation', () => {
    const v = measurementVerdict({ quantity: 'esr', expected: '4700u', rating: '16V', reading: '0.15' });
    expectRelative(v.reference!, 0.2); // Table A: 4,700 µF, 16 V = 0.20 Ω
    expect(v.reason).not.toMatch(/extrapolated/);
    expect(v.verdict).toBe('within');
  });

  it('when an ESR meter shows OL, then the part is out (open)', () => {
    const v = measurementVerdict({ quantity: 'esr', expected: '47µ', rating: '450', reading: 'OL' }); // common practice, no source: an open capacitor reads OL
    expect(v).toMatchObject({ verdict: 'out', overRange: true, deviation: null });
  });

  it('when a 22 µF 25 V part leaks 4 µA, then the datasheet rule (0.01·C·V or 3 µA → 5.5 µA) passes it', () => {
    // general-purpose 105 °C radial series datasheet rule: 0.01 × 22 × 25 = 5.5 µA (by hand)
    const v = measurementVerdict({ quantity: 'leakage', expected: '22u', rating: '25V', reading: '4u' });
    expect(v.verdict).toBe('within');
    expect(v.reference).toBeCloseTo(5.5e-6, 12);
  });

  it('when the tolerance says max, then an earth-continuity reading is judged against that maximum', () => {
    // from memory: in-service inspection code of practice, earth continuity at most 0.1 Ω plus the lead
    expect(
      measurementVerdict({ quantity: 'resistance', expected: '0.1', tolerance: 'max', reading: '0.08' }),
    ).toMatchObject({
      verdict: 'within',
      limit: 'maximum',
    });
    expect(
      measurementVerdict({ quantity: 'resistance', expected: '0.1', tolerance: 'max', reading: '0.3' }).verdict,
    ).toBe('out');
  });
});

describe('measurementVerdict against a minimum', () => {
  it('when insulation reads 200 MΩ against a 2 MΩ minimum, then it says so rather than a per cent', () => {
    // in-service inspection code of practice (IET), as quoted in its own magazine: Class II ≥ 2 MΩ at 500 V DC
    const v = measurementVerdict({ quantity: 'insulation', expected: '2M', reading: '200M' });
    expect(v.verdict).toBe('within');
    expect(v.summary).toBe('200 MΩ, above the 2 MΩ minimum');
    expect(v.reason).not.toMatch(/%/);
  });

  it('when insulation reads 0.4 MΩ with no minimum given, then it fails the 1 MΩ Class I minimum', () => {
    // same code of practice: Class I ≥ 1 MΩ at 500 V DC
    const v = measurementVerdict({ quantity: 'insulation', reading: '400k' });
    expect(v.verdict).toBe('out');
    expect(v.summary).toBe('400 kΩ, below the 1 MΩ minimum');
  });

  it('when the tester shows OL or "> 200 M", then it is over range and passes', () => {
    // common practice, no source: an insulation tester over range means more than its top range
    expect(measurementVerdict({ quantity: 'insulation', reading: 'OL' })).toMatchObject({
      verdict: 'within',
      overRange: true,
    });
    const v = measurementVerdict({ quantity: 'insulation', expected: '2M', reading: '> 200 M' });
    expect(v).toMatchObject({ verdict: 'within', overRange: true, reading: 200e6 });
    expect(v.summary).toBe('over range (above 200 MΩ), above the 2 MΩ minimum');
  });
});

describe('measurementVerdict against a nominal value', () => {
  it('when an electrolytic has no tolerance typed, then −20 %/+50 % applies: 65 µF for 47 µF is within', () => {
    // IEC 60062 letter S: −20 %/+50 %; by hand 65/47 − 1 = +38.3 %
    const v = measurementVerdict({ quantity: 'capacitance', expected: '47u', reading: '65u' });
    expect(v.verdict).toBe('within');
    expect(v.reason).toMatch(/IEC 60062 letter S/);
    expect(v.summary).toBe('+38.3 %');
  });

  it('when the same electrolytic reads 36 µF, then −23.4 % is marginal', () => {
    expectRelative(
      measurementVerdict({ quantity: 'capacitance', expected: '47u', reading: '36u' }).deviation!,
      36 / 47 - 1,
    ); // by hand
    expect(measurementVerdict({ quantity: 'capacitance', expected: '47u', reading: '36u' }).verdict).toBe('marginal'); // IEC 60062 S, Gridleak's 1.5 × band
  });

  it('when a letter tolerance is typed, then it is read: 112 nF for 100 nF K is marginal', () => {
    expect(
      measurementVerdict({ quantity: 'capacitance', expected: '100n', tolerance: 'K', reading: '112n' }).verdict,
    ).toBe('marginal'); // IEC 60062 K = ±10 %
  });

  it('when the part says its tolerance after the value, then that band is used instead of the default', () => {
    // IEC 60062: K = ±10 %, so 112 nF for "100n K" is marginal; J = ±5 %, so 2.35 kΩ for "2k2 J" (+6.8 %, by hand) is marginal
    expect(measurementVerdict({ quantity: 'capacitance', expected: '100n K', reading: '112n' }).verdict).toBe(
      'marginal',
    );
    expect(measurementVerdict({ quantity: 'resistance', expected: '2k2 J', reading: '2.35k' }).verdict).toBe(
      'marginal',
    );
    expect(measurementVerdict({ quantity: 'resistance', expected: '2k2 ±2 %', reading: '2.35k' }).verdict).toBe('out'); // IEC 60062 G band written in per cent
    // IEC 60062 letter Z band written out, −20/+80 %: 80 µF for "47µ -20/+80" is within (+70 %, by hand)
    expect(measurementVerdict({ quantity: 'capacitance', expected: '47µ -20/+80', reading: '80u' }).verdict).toBe(
      'within',
    );
  });

  it('when an IF reads 75 kHz off its 470 kHz, then it is out, although only 16 %', () => {
    // common practice, no source: an AM IF is set to within a couple of kHz, an absolute tolerance
    const v = measurementVerdict({ quantity: 'frequency', expected: '470k', reading: '395k' });
    expect(v.verdict).toBe('out');
    expect(v.summary).toBe('\u221275 kHz');
  });

  it('when the IF reads 471 kHz, then it is within; at 472.5 kHz marginal', () => {
    expect(measurementVerdict({ quantity: 'frequency', expected: '470k', reading: '471k' }).verdict).toBe('within'); // common practice, no source
    expect(measurementVerdict({ quantity: 'frequency', expected: '470k', reading: '472.5k' }).verdict).toBe('marginal'); // 2.5 kHz: within 1.5 × 2 kHz
  });

  it('when an anode reads 290 V against a chart’s 250 V with no tolerance, then ±20 % applies and says it is common practice', () => {
    const v = measurementVerdict({ quantity: 'dc-voltage', expected: '250', reading: '290 V' });
    expect(v.verdict).toBe('within'); // common practice, no source: ±20 % on service charts
    expect(v.reason).toMatch(/common practice/);
    expect(v.summary).toBe('+16.0 %'); // by hand: 40 / 250
  });

  it('when a cathode bias is typed positive against the data sheet’s negative grid bias, then the sizes are compared and a hint explains', () => {
    // from memory: EL84 Vg1 −7.3 V; a meter cathode to chassis reads the same bias as +7.4 V
    const v = measurementVerdict({ quantity: 'dc-voltage', expected: '\u22127.3', reading: '7.4 V' });
    expect(v.verdict).toBe('within');
    expectRelative(v.deviation!, 7.4 / 7.3 - 1); // by hand: +1.4 %, not −201 %
    expect(v.hint).toMatch(/opposite signs/);
  });

  it('when nothing is expected, then the verdict is unknown with a reason', () => {
    expect(measurementVerdict({ quantity: 'current', reading: '62 mA' })).toMatchObject({
      verdict: 'unknown',
      reason: 'No expected value to compare with.',
    });
  });
});

describe('measurementVerdict refuses what cannot be', () => {
  it('when a resistance or ESR is negative, then it is refused with the likely cause', () => {
    expect(() => measurementVerdict({ quantity: 'esr', expected: '47u', rating: '450', reading: '-0.2' })).toThrow(
      /an ESR cannot be negative .* leads/,
    ); // Gridleak's own message
    expect(() => measurementVerdict({ quantity: 'resistance', expected: '4k7', reading: '\u22124k7' })).toThrow(
      /a resistance cannot be negative/,
    );
  });

  it('when an AC voltage is typed with a minus, then it is refused: an AC meter reads a magnitude', () => {
    // An AC meter reads RMS, a magnitude with no sign (common practice, no source).
    expect(() => measurementVerdict({ quantity: 'ac-voltage', expected: '6.3', reading: '-6.2 V' })).toThrow(
      /^Reading: an AC voltage cannot be negative \(-6.2 V typed\)\. An AC meter shows the size/,
    ); // Gridleak's own message
    expect(() => measurementVerdict({ quantity: 'ac-voltage', expected: '-6.3', reading: '6.2 V' })).toThrow(
      /^Expected value: must be above zero/,
    );
    // A DC voltage keeps its sign: a grid bias is negative (common practice, no source).
    expect(measurementVerdict({ quantity: 'dc-voltage', expected: '-7', reading: '-7.2 V' }).verdict).toBe('within');
  });

  it('when a bare OL has nothing to be judged against, then it asks for the range’s top', () => {
    expect(() => measurementVerdict({ quantity: 'resistance', reading: 'OL' })).toThrow(/^Reading: 'OL' is over range/); // Gridleak's own message
    expect(measurementVerdict({ quantity: 'resistance', reading: '> 20 M' })).toMatchObject({
      verdict: 'unknown',
      overRange: true,
      reading: 20e6,
    });
  });

  it('when values are unparseable or in the wrong unit, then the error says which field', () => {
    expect(() => measurementVerdict({ quantity: 'resistance', expected: 'four k', reading: '4k7' })).toThrow(
      /^Expected value:/,
    ); // Gridleak's own message
    expect(() => measurementVerdict({ quantity: 'resistance', expected: '4k7', reading: '250 V' })).toThrow(
      /^Reading:/,
    );
  });
});

describe('parseTolerance', () => {
  it('when written as per cent, then it becomes fractions', () => {
    expect(parseTolerance('±10 %')).toBe(0.1); // per cent to fraction
    expect(parseTolerance('-20/+50')).toEqual({ minus: 0.2, plus: 0.5 }); // IEC 60062 letter S: −20 %/+50 %
    expect(() => parseTolerance('ten')).toThrow(/per cent/); // Gridleak's own message
  });
});
