import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { esrFromTanDelta, esrLimit, esrLimitDetail } from './index';
import { expectRelative } from './bench-test-support';

// "Table A": widely circulated technicians' table of worst-case ESR for new electrolytics,
// 100 kHz, 20 °C (BENCH-REFERENCE §4; glodark.com/design/esrchart.htm). Interpolated values via mathjs.

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
  it('passes a healthy 50 µF 400 V filter reading 0.5 Ω against about 0.8 Ω', () => {
    // common practice, no source: a healthy 50 µF 400 V filter electrolytic reads 0.5 Ω, expected maximum about 0.8 Ω
    expectRelative(esrLimit(50e-6, 400), 0.8, 0.05);
    expect(0.5).toBeLessThanOrEqual(esrLimit(50e-6, 400));
  });

  it('says that it used the 250 V column as an extrapolation', () => {
    const detail = esrLimitDetail(50e-6, 400);
    expect(detail.extrapolated).toBe(true); // Table A stops at 250 V
    expect(detail.note).toMatch(/250 V column/); // Table A column heading
    expect(detail.testHertz).toBe(100e3); // Table A: 100 kHz class meters
  });

  it('carries the table\u2019s caution about readings above double', () => {
    expect(esrLimitDetail(100e-6, 25).note).toMatch(/double/); // Table A: "be wary of a capacitor reading more than double"
  });
});

describe('esrFromTanDelta converts a datasheet dissipation factor', () => {
  it('gives several ohms at 120 Hz for a 50 µF 400 V part, not comparable with a 100 kHz limit', () => {
    // DS-generic: tan δ max 0.25 at 120 Hz for 400 V; ESR = tan δ/(2πfC) computed with mathjs
    const ohms = esrFromTanDelta(0.25, 50e-6, 120);
    expectRelative(ohms, math.evaluate('0.25 / (2*pi*120*50e-6)') as number);
    expect(ohms).toBeGreaterThan(5 * esrLimit(50e-6, 400)); // BENCH-REFERENCE §4: several Ω vs tenths of an Ω
  });
});

describe('esrLimit refuses impossible parts', () => {
  it('refuses zero capacitance with a readable message', () => {
    expect(() => esrLimit(0, 400)).toThrow(/capacitance \(F\) must be a number above zero/); // product rule
  });
});
