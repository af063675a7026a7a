import { describe, expect, it } from 'vitest';
import { loadedReading, measurementVerdict, meterCorrection, meterOhms, parseMeter } from './index';
import { expectRelative } from './bench-test-support';

// Textbook worked example ("Meters: loading effect", edudirectory.50webs.com/tutorials/elect99.htm): 30 V across two
// equal 400 kΩ resistors, a 20,000 Ω/V meter on its 20 V range (400 kΩ) reads 10 V where 15 V is expected.

describe('meterOhms', () => {
  it('when a 20,000 Ω/V meter is on its 20 V range, then it is 400 kΩ', () => {
    expect(meterOhms({ ohmsPerVolt: 20e3, rangeVolts: 20 })).toBe(400e3); // textbook worked example: 20 × 20,000 = 400 kΩ
  });

  it('when a 1,000 Ω/V meter is on its 1,000 V range, then it is 1 MΩ', () => {
    // Navy electricity and electronics training series: meter resistance = sensitivity × full-scale volts
    expect(meterOhms({ ohmsPerVolt: 1e3, rangeVolts: 1e3 })).toBe(1e6);
  });

  it('when a digital meter is given by its input, then that is its resistance', () => {
    expect(meterOhms({ inputOhms: 10e6 })).toBe(10e6); // textbook notes on DC meter loading: a DMM is 10 to 20 MΩ on all ranges
  });
});

describe('loadedReading', () => {
  it('when the 400 kΩ meter reads across one of two 400 kΩ resistors from 30 V, then it shows 10 V, not 15 V', () => {
    // textbook worked example: Thévenin source 15 V behind 400 k ∥ 400 k = 200 kΩ
    expectRelative(loadedReading({ openCircuitVolts: 15, sourceOhms: 200e3, meterOhms: 400e3 }), 10);
  });

  it('when the source resistance is zero, then the meter reads the full voltage', () => {
    expect(loadedReading({ openCircuitVolts: 250, sourceOhms: 0, meterOhms: 1e6 })).toBe(250); // voltage divider with no upper arm
  });
});

describe('meterCorrection', () => {
  it('when the chart read 10 V with the 400 kΩ meter, then the point is 15 V unloaded, as the textbook correction gives', () => {
    // textbook DC-meter-effect notes: V = VM + [R1R2 / (RV(R1 + R2))]·VM = 10 + 0.5 × 10 = 15 V
    const c = meterCorrection({
      chartVolts: 10,
      sourceOhms: 200e3,
      chartMeter: { ohmsPerVolt: 20e3, rangeVolts: 20 },
      yourMeter: { inputOhms: 10e6 },
    });
    expectRelative(c.openCircuitVolts, 15);
    expectRelative(c.expectedOnYourMeter, 14.70588, 1e-5); // worked by hand: 15 × 10 M / 10.2 M
  });

  it('when a chart taken with 1 kΩ/V (1,000 V range) says 100 V behind 100 kΩ, then a 20 kΩ/V meter on 250 V reads about 8 % higher', () => {
    // worked by hand with the divider formula: open circuit 100 × 1.1 M / 1 M = 110 V; 110 × 5 M / 5.1 M = 107.84 V
    const c = meterCorrection({
      chartVolts: 100,
      sourceOhms: 100e3,
      chartMeter: { ohmsPerVolt: 1e3, rangeVolts: 1e3 },
      yourMeter: { ohmsPerVolt: 20e3, rangeVolts: 250 },
    });
    expectRelative(c.expectedOnYourMeter, 107.843, 1e-5);
    expect(c.words).toBe("A 20 kΩ/V meter here reads about 8 % higher than the manual's 1 kΩ/V meter.");
  });

  it('refuses a meter with no sensitivity', () => {
    expect(() => meterOhms({ ohmsPerVolt: 0, rangeVolts: 250 })).toThrow(
      /sensitivity \(Ω\/V\) must be a number above zero/,
    ); // Gridleak's own message (not a computation)
  });
});

describe('parseMeter and a voltage reading judged against the chart’s meter', () => {
  it('when a meter is written as people write it, then its resistance follows', () => {
    // Navy electricity and electronics training series: meter resistance = sensitivity × full-scale volts
    expect(meterOhms(parseMeter('20 kΩ/V, 250 V range'))).toBe(5e6);
    expect(meterOhms(parseMeter('1000 ohms per volt on 1000 V'))).toBe(1e6);
    expect(parseMeter('DMM 10 MΩ')).toEqual({ inputOhms: 10e6 }); // textbook DC-meter-effect notes: a DMM is 10 MΩ on all ranges
  });

  it('when a chart taken with 1 kΩ/V says 100 V behind 100 kΩ and a 20 kΩ/V meter reads 106 V, then it is within, not +6 %', () => {
    // worked by hand with the divider formula: your meter should read 107.84 V there; 106 V is −1.7 % of that
    const v = measurementVerdict({
      quantity: 'dc-voltage',
      expected: '100',
      tolerance: '5',
      reading: '106',
      chartMeter: '1k/V 1000 V',
      meter: '20 kΩ/V 250 V',
      source: '100k',
    });
    expectRelative(v.reference!, 107.843, 1e-5);
    expect(v.verdict).toBe('within');
    expect(v.meterWords).toBe("A 20 kΩ/V meter here reads about 8 % higher than the manual's 1 kΩ/V meter.");
    // without the meters, 106 V against 100 V ±5 % would be marginal
    expect(
      measurementVerdict({ quantity: 'dc-voltage', expected: '100', tolerance: '5', reading: '106' }).verdict,
    ).toBe('marginal');
  });

  it('when the chart’s meter cannot be read, then the message names that field', () => {
    expect(() =>
      measurementVerdict({
        quantity: 'dc-voltage',
        expected: '100',
        reading: '106',
        chartMeter: 'old Avo',
        meter: '10M',
        source: '100k',
      }),
    ).toThrow(/^Chart's meter:/); // Gridleak's own message
  });
});
