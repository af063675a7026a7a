import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { esrFromTanDelta, esrLimit, esrLimitDetail } from './index';
import { expectRelative } from './bench-test-support';

// "Table A": widely circulated technicians' table of worst-case ESR for new electrolytics,
// 100 kHz, 20 °C (glodark.com/design/esrchart.htm; the same table on solidpost.com). Interpolated values via mathjs.

describe('esrLimit follows Table A', () => {
  it('gives the published cell values on the table rows and columns', () => {
    expectRelative(esrLimit(47e-6, 63), 0.56); // Table A: 47 µF, 63 V
    expectRelative(esrLimit(100e-6, 10), 1.2); // Table A: 100 µF, 10 V
    expectRelative(esrLimit(22e-6, 250), 1.8); // Table A: 22 µF, 250 V
    expectRelative(esrLimit(470e-6, 100), 0.05); // Table A: 470 µF, 100 V
  });

  it('interpolates log-log between capacitance rows', () => {
    // Table A 35 V: 47 µF 0.68 Ω, 100 µF 0.32 Ω; at the geometric mean of C the log-log value is the geometric mean of ESR (mathjs)
    const farads = math.evaluate('sqrt(47e-6 * 100e-6)') as number;
    expectRelative(esrLimit(farads, 35), math.evaluate('sqrt(0.68 * 0.32)') as number, 1e-9);
  });

  it('interpolates log-log between voltage columns', () => {
    // Table A 10 µF: 35 V 3.2 Ω, 63 V 2.4 Ω; a 50 V part lies between (mathjs)
    const expected = math.evaluate('exp(log(3.2) + log(50/35)/log(63/35) * log(2.4/3.2))') as number;
    expectRelative(esrLimit(10e-6, 50), expected);
    expect(esrLimitDetail(10e-6, 50).extrapolated).toBe(false); // inside Table A
  });
});

describe('esrLimit for valve-set reservoir capacitors above the table', () => {
  it('gives a 47 µF 450 V reservoir the 250 V column’s 0.8 Ω', () => {
    expectRelative(esrLimit(47e-6, 450), 0.8); // Table A: 47 µF, 250 V = 0.8 Ω; the table has no column above 250 V
  });

  it('says that it used the 250 V column as an extrapolation', () => {
    const detail = esrLimitDetail(47e-6, 450);
    expect(detail.extrapolated).toBe(true); // Table A stops at 250 V
    expect(detail.note).toMatch(/250 V column/); // Table A column heading
    expect(detail.testHertz).toBe(100e3); // Table A: 100 kHz class meters
  });

  it('carries the table\u2019s caution about readings above double', () => {
    expect(esrLimitDetail(100e-6, 25).note).toMatch(/double/); // Table A: "be wary of a capacitor reading more than double"
  });
});

describe('esrFromTanDelta converts a datasheet dissipation factor', () => {
  it('gives several ohms at 120 Hz for a 47 µF 450 V part, not comparable with a 100 kHz limit', () => {
    // a maker's general-purpose radial series datasheet: tan δ max 0.25 at 120 Hz for 450 V; ESR = tan δ/(2πfC) via mathjs
    const ohms = esrFromTanDelta(0.25, 47e-6, 120);
    expectRelative(ohms, math.evaluate('0.25 / (2*pi*120*47e-6)') as number);
    expectRelative(ohms, 7.05, 0.001); // by hand: 0.25 / 0.03544
    expect(ohms).toBeGreaterThan(5 * esrLimit(47e-6, 450)); // several Ω at 120 Hz against Table A's tenths of an Ω at 100 kHz
  });
});

describe('esrLimit uses the table rows above 1,000 µF', () => {
  it('gives 4,700 µF 16 V its own 0.20 Ω, not an extrapolation', () => {
    expectRelative(esrLimit(4700e-6, 16), 0.2); // Table A: 4,700 µF, 16 V = 0.20 Ω
    expect(esrLimitDetail(4700e-6, 16).extrapolated).toBe(false);
  });

  it('gives 10,000 µF 35 V its 0.04 Ω and 4,700 µF 63 V its 0.04 Ω', () => {
    expectRelative(esrLimit(10000e-6, 35), 0.04); // Table A: 10,000 µF, 35 V
    expectRelative(esrLimit(4700e-6, 63), 0.04); // Table A: 4,700 µF, 63 V
  });

  it('interpolates log-log between 1,000 µF and 4,700 µF', () => {
    // Table A 25 V: 1,000 µF 0.08 Ω, 4,700 µF 0.12 Ω; at the geometric mean of C the value is the geometric mean (mathjs)
    const farads = math.evaluate('sqrt(1000e-6 * 4700e-6)') as number;
    expectRelative(esrLimit(farads, 25), math.evaluate('sqrt(0.08 * 0.12)') as number);
  });
});

describe('esrLimit refuses impossible parts', () => {
  it('refuses zero capacitance with a readable message', () => {
    expect(() => esrLimit(0, 400)).toThrow(/capacitance \(F\) must be a number above zero/); // Gridleak's own message (not a computation)
  });
});
