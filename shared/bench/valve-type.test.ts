import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { BenchInputError, valveType } from './index';
import { expectRelative } from './bench-test-support';

// Letter and digit meanings: Mullard–Philips tube designation (encyclopedia article and collector
// pages, BENCH-REFERENCE §7a–7c). Valve data and equivalents as noted per check (§6, §7e).

describe('valveType decodes the heater letter', () => {
  it('reads E as a 6.3 V parallel heater and takes the EL84\u2019s current from its data', () => {
    const el84 = valveType('EL84');
    expect(el84.heater.letter).toBe('E'); // designation: first letter
    expect(el84.heater.supply).toBe('parallel'); // designation: E = 6.3 V parallel
    expect(el84.heater.volts).toBe(6.3); // encyclopedia article: EL84 heater 6.3 V
    expect(el84.heater.amps).toBe(0.76); // encyclopedia article: EL84 heater 0.76 A
  });

  it('reads U as a 100 mA series heater', () => {
    const heater = valveType('UL41').heater;
    expect(heater.supply).toBe('series'); // designation: U = 100 mA series
    expect(heater.amps).toBe(0.1); // designation: U = 100 mA
  });

  it('gives the UCH81 a 19 V heater', () => {
    expect(valveType('UCH81').heater.volts).toBe(19); // valve data site, HCH81 note: UCH81 is the 19 V / 100 mA version
  });

  it('reads D as a battery valve', () => {
    expect(valveType('DK96').heater.supply).toBe('battery'); // designation: D = battery, 1.4 V
  });

  it('adds the classic AC/DC line-up to 116.6 V of heaters', () => {
    // from memory: UCH42 14 + UAF42 12.6 + UBC41 14 + UL41 45 + UY41 31 (BENCH-REFERENCE §6), summed by mathjs
    const total = ['UCH42', 'UAF42', 'UBC41', 'UL41', 'UY41'].reduce((sum, name) => sum + (valveType(name).heater.volts ?? 0), 0);
    expectRelative(total, math.evaluate('14 + 12.6 + 14 + 45 + 31') as number);
  });
});

describe('valveType names the electrode systems', () => {
  it('reads EL84 as one output pentode', () => {
    expect(valveType('EL84').systems).toEqual(['power pentode or beam tetrode']); // designation: L = power pentode
  });

  it('reads ECC83 as two triodes', () => {
    expect(valveType('ECC83').systems).toEqual(['small-signal triode', 'small-signal triode']); // designation: C = triode
  });

  it('reads EABC80 as a diode, a double diode and a triode', () => {
    expect(valveType('EABC80').systems).toEqual(['single signal diode', 'double diode, common cathode', 'small-signal triode']); // designation: A, B, C
  });

  it('reads EZ80 as a full-wave rectifier', () => {
    expect(valveType('EZ80').systems).toEqual(['full-wave rectifier']); // designation: Z = full-wave vacuum rectifier
  });
});

describe('valveType finds the base from the digits', () => {
  it('puts 8x types on the noval base', () => {
    expect(valveType('EL84').base).toMatch(/noval/); // designation: 80–89 noval B9A
  });

  it('puts PL504 on the magnoval base, not where "ignore the first digit" would', () => {
    expect(valveType('PL504').base).toBe('magnoval (B9D)'); // designation: 5xx magnoval
  });

  it('puts 8xx types on noval too', () => {
    expect(valveType('ECC808').base).toMatch(/noval/); // designation: 8xx noval
  });

  it('drops the leading 1 of 18x and 19x', () => {
    expect(valveType('EF183').base).toMatch(/noval/); // designation: 18x noval
    expect(valveType('EC92').base).toBe('miniature (B7G)'); // designation: 90–99 B7G
  });

  it('puts 2xx on decal, 4x on Rimlock and 3x on octal', () => {
    expect(valveType('PCF200').base).toMatch(/decal/); // designation: 2xx decal B10B
    expect(valveType('UL41').base).toMatch(/Rimlock/); // designation: 40–49 Rimlock B8A
    expect(valveType('EL34').base).toBe('international octal'); // designation: 30–39 octal
  });
});

describe('valveType handles special-quality names and unlisted types', () => {
  it('reads E88CC as a special-quality double triode on noval', () => {
    const e88cc = valveType('E88CC');
    expect(e88cc.specialQuality).toBe(true); // designation: digits between letters = special quality
    expect(e88cc.systems).toHaveLength(2); // designation: CC = two triodes
    expect(e88cc.base).toMatch(/noval/); // designation: 8x noval
  });

  it('relates E80F to the EF80', () => {
    expect(valveType('e80f').standardForm).toBe('EF80'); // designation article: E80F = EF80
  });

  it('still decodes an unlisted type, without data', () => {
    const el34 = valveType('EL34');
    expect(el34.data).toBeUndefined(); // EL34 is not in Gridleak's table; designation decode only
    expect(el34.heater.volts).toBe(6.3); // designation: E = 6.3 V
  });
});

describe('valveType gives American equivalents', () => {
  it('pairs the common radio types', () => {
    expect(valveType('ECC83').equivalents).toContain('12AX7'); // encyclopedia article
    expect(valveType('EL84').equivalents).toContain('6BQ5'); // two encyclopedia articles
    expect(valveType('ECH81').equivalents).toContain('6AJ8'); // valve data site equivalence list
    expect(valveType('EZ80').equivalents).toContain('6V4'); // valve data site
    expect(valveType('EABC80').equivalents).toContain('6AK8'); // public schematic-symbol library
    expect(valveType('ECC85').equivalents).toContain('6AQ8'); // from memory
  });

  it('flags recalled data as from memory', () => {
    expect(valveType('UL41').data?.confidence).toBe('from memory'); // BENCH-REFERENCE §6: UL41 heater from memory
  });
});

describe('valveType refuses what is not a European designation', () => {
  it('explains the expected pattern', () => {
    // product rule: the message from the brief
    expect(() => valveType('XQ9Z')).toThrow(
      "'XQ9Z' is not a European valve designation: expected a heater letter, one or more system letters and digits, e.g. EL84",
    );
  });

  it('recognises an American type number', () => {
    expect(() => valveType('6BQ5')).toThrow(/American type number/); // RETMA names start with the heater voltage
  });

  it('names an unknown heater letter', () => {
    expect(() => valveType('JL84')).toThrow(BenchInputError); // designation: J is not a heater letter
  });
});
