import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { BenchInputError, valveType } from './index';
import { expectRelative } from './bench-test-support';

// Letter and digit meanings: the European valve type code (heater letter, system letters, base digits), per the
// numbering-systems articles (tubedata.info "Tube number systems"; electronics-notes.com "Valve / tube numbering
// systems"). Valve data and equivalents as noted per check; "code:" marks a check of the letter and digit tables.

describe('valveType decodes the heater letter of the European valve type code (heater letter, system letters, base digits)', () => {
  it('reads E as a 6.3 V parallel heater and takes the EL84\u2019s current from its data', () => {
    const el84 = valveType('EL84');
    expect(el84.heater.letter).toBe('E'); // code: first letter
    expect(el84.heater.supply).toBe('parallel'); // code: E = 6.3 V parallel
    expect(el84.heater.volts).toBe(6.3); // encyclopedia article: EL84 heater 6.3 V
    expect(el84.heater.amps).toBe(0.76); // encyclopedia article: EL84 heater 0.76 A
  });

  it('reads U as a 100 mA series heater', () => {
    const heater = valveType('UL41').heater;
    expect(heater.supply).toBe('series'); // code: U = 100 mA series
    expect(heater.amps).toBe(0.1); // code: U = 100 mA
  });

  it('gives the UCH81 a 19 V heater', () => {
    expect(valveType('UCH81').heater.volts).toBe(19); // valve data site, HCH81 note: UCH81 is the 19 V / 100 mA version
  });

  it('reads D as a battery valve', () => {
    expect(valveType('DK96').heater.supply).toBe('battery'); // code: D = battery, 1.4 V
  });

  it('adds the classic AC/DC line-up to 116.6 V of heaters', () => {
    // from memory: UCH42 14 + UAF42 12.6 + UBC41 14 + UL41 45 + UY41 31 (valve data handbook as recalled), summed by mathjs
    const total = ['UCH42', 'UAF42', 'UBC41', 'UL41', 'UY41'].reduce(
      (sum, name) => sum + (valveType(name).heater.volts ?? 0),
      0,
    );
    expectRelative(total, math.evaluate('14 + 12.6 + 14 + 45 + 31') as number);
  });
});

describe('valveType names the electrode systems', () => {
  it('reads EL84 as one output pentode', () => {
    expect(valveType('EL84').systems).toEqual(['power pentode or beam tetrode']); // code: L = power pentode
  });

  it('reads ECC83 as two triodes', () => {
    expect(valveType('ECC83').systems).toEqual(['small-signal triode', 'small-signal triode']); // code: C = triode
  });

  it('reads EABC80 as a diode, a double diode and a triode', () => {
    expect(valveType('EABC80').systems).toEqual([
      'single signal diode',
      'double diode, common cathode',
      'small-signal triode',
    ]); // code: A, B, C
  });

  it('reads EZ80 as a full-wave rectifier', () => {
    expect(valveType('EZ80').systems).toEqual(['full-wave rectifier']); // code: Z = full-wave vacuum rectifier
  });
});

describe('valveType finds the base from the digits', () => {
  it('puts 8x types on the noval base', () => {
    expect(valveType('EL84').base).toMatch(/noval/); // code: 80–89 noval B9A
  });

  it('puts PL504 on the magnoval base, not where "ignore the first digit" would', () => {
    expect(valveType('PL504').base).toBe('magnoval (B9D)'); // code: 5xx magnoval
  });

  it('puts 8xx types on noval too', () => {
    expect(valveType('ECC808').base).toMatch(/noval/); // code: 8xx noval
  });

  it('drops the leading 1 of 18x and 19x', () => {
    expect(valveType('EF183').base).toMatch(/noval/); // code: 18x noval
    expect(valveType('EC92').base).toBe('miniature (B7G)'); // code: 90–99 B7G
  });

  it('puts 2xx on decal, 4x on Rimlock and 3x on octal', () => {
    expect(valveType('PCF200').base).toMatch(/decal/); // code: 2xx decal B10B
    expect(valveType('UL41').base).toMatch(/Rimlock/); // code: 40–49 Rimlock B8A
    expect(valveType('EL34').base).toBe('international octal'); // code: 30–39 octal
  });
});

describe('valveType handles special-quality names and unlisted types', () => {
  it('reads E88CC as a special-quality double triode on noval', () => {
    const e88cc = valveType('E88CC');
    expect(e88cc.specialQuality).toBe(true); // code: digits between letters = special quality
    expect(e88cc.systems).toHaveLength(2); // code: CC = two triodes
    expect(e88cc.base).toMatch(/noval/); // code: 8x noval
  });

  it('relates E80F to the EF80', () => {
    expect(valveType('e80f').standardForm).toBe('EF80'); // numbering-systems article: E80F = EF80
  });

  it('still decodes an unlisted type, without data', () => {
    const el34 = valveType('EL34');
    expect(el34.data).toBeUndefined(); // EL34 is not in Gridleak's table; designation decode only
    expect(el34.heater.volts).toBe(6.3); // code: E = 6.3 V
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
    expect(valveType('UL41').data?.confidence).toBe('from memory'); // from memory: no published UL41 data was found, so the record says so
  });
});

describe('valveType reads American type numbers', () => {
  it('when given 6V6GT, then the leading 6 is a 6.3 V heater and GT a glass T-9 bulb', () => {
    const v = valveType('6V6GT');
    expect(v.scheme).toBe('american'); // collector's RETMA numbering page: a name starting with the heater voltage
    expect(v.heater.volts).toBe(6.3); // RETMA numbering page: 6 = 6.0–6.9 V (6.3 V)
    expect(v.suffixWords).toContain('glass T-9 bulb (GT)'); // RETMA numbering page: GT = glass T-9
    expect(v.standardForm).toBe('6V6'); // same page: suffixes mark bulb and revision, not another type
  });

  it('when given 50C5 and 35W4, then they are series-string heaters of 50 and 35 V', () => {
    expect(valveType('50C5').heater).toMatchObject({ volts: 50, supply: 'series' }); // RETMA numbering page: 50 = 50 V heater
    expect(valveType('35W4').heater).toMatchObject({ volts: 35, supply: 'series' }); // RETMA numbering page: 35 = 35 V heater
    expect(valveType('35W4').heater.amps).toBe(0.15); // from memory: 150 mA series heater
  });

  it('when given 12AX7, then it is a 12.6 V heater with the ECC83 as its European equivalent', () => {
    const v = valveType('12AX7');
    expect(v.heater.volts).toBe(12.6); // encyclopedia article on the 12AX7: 12.6 V 0.15 A in series
    expect(v.equivalents).toContain('ECC83'); // encyclopedia article: 12AX7 = ECC83
  });

  it('when given 6BQ5A, then it pairs with the EL84 and reads A as an improved version', () => {
    expect(valveType('6BQ5A').equivalents).toContain('EL84'); // two encyclopedia articles: EL84 = 6BQ5
    expect(valveType('6BQ5A').suffixWords).toContain('improved version (A)'); // RETMA numbering page: A/B/C = improved
  });

  it('when given a British name that begins with P (PX4), then it is not read as a 300 mA series type', () => {
    const v = valveType('PX4');
    expect(v.scheme).toBe('british'); // from memory: PX4 is a British 4 V directly heated triode, outside the European code
    expect(v.heater.supply).toBe('parallel');
  });
});

describe('valveType refuses what follows neither the European valve type code (heater letter, system letters, base digits) nor an American type number', () => {
  it('explains the expected pattern', () => {
    // Gridleak's own message (not a computation)
    expect(() => valveType('XQ9Z')).toThrow(
      "'XQ9Z' does not follow the European valve type code (heater letter, system letters, base digits), e.g. EL84",
    );
  });

  it('when a name starts with a digit but is no American type number, then the message says what one looks like', () => {
    expect(() => valveType('6')).toThrow(/American type number: heater volts, letters, a digit/); // RETMA numbering page: number, letters, digit
  });

  it('names an unknown heater letter', () => {
    expect(() => valveType('JL84')).toThrow(BenchInputError); // code: J is not a heater letter
  });
});
