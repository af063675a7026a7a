import { describe, expect, it } from 'vitest';
import { liveChassisLikely } from './index';

// Series heaters across the mains mean an AC/DC set with a live chassis (restorers' forum, vintage-radio.net; a test-gear
// manual's section on hot chassis). Heater figures per type as recalled from valve data handbooks (from memory).

describe('liveChassisLikely', () => {
  it('when the line-up is the U-series Rimlock five, then every valve and the 116.6 V chain say live', () => {
    const result = liveChassisLikely(['UCH42', 'UAF42', 'UBC41', 'UL41', 'UY41']);
    expect(result.likely).toBe(true); // code: U = 100 mA series heater
    expect(result.reasons).toHaveLength(6); // five series valves and the chain's total
    expect(result.reasons.at(-1)).toMatch(/5 valves at 100 mA add up to 116.6 V/); // from memory: 14 + 12.6 + 14 + 45 + 31
  });

  it('when the line-up is the usual 6.3 V noval AM/FM set, then nothing says live', () => {
    // two German restoration pages: ECC85 ECH81 EF89 EABC80 EL84 EM80 (+ rectifier), all 6.3 V
    const result = liveChassisLikely(['ECC85', 'ECH81', 'EF89', 'EABC80', 'EL84', 'EM80', 'EZ80']);
    expect(result.likely).toBe(false);
    expect(result.unknown).toEqual([]);
  });

  it('when the American five-valve 150 mA line-up is given, then the 50 and 35 V valves and the chain say live', () => {
    // from memory: 12BE6 12BA6 12AV6 (12.6 V) + 50C5 + 35W4, 150 mA, 122.8 V straight across the mains
    const result = liveChassisLikely(['12BE6', '12BA6', '12AV6', '50C5', '35W4']);
    expect(result.likely).toBe(true);
    expect(result.reasons).toEqual([
      '50C5: 50 V heater at 150 mA, made for series strings',
      '35W4: 35 V heater at 150 mA, made for series strings',
      '5 valves at 150 mA add up to 122.8 V of heaters: a series string across the mains',
    ]);
  });

  it('when an American 25 or 117 V type is listed without heater current data, then its number alone says series', () => {
    // collector's RETMA numbering page: the leading number is the heater voltage; 25 and 117 V heaters run only across the mains
    expect(liveChassisLikely(['25L6GT']).reasons).toEqual(['25L6GT: 25 V heater, made for series strings']);
    expect(liveChassisLikely(['117Z3']).likely).toBe(true);
  });

  it('when a 12AX7 stands alone, then it proves nothing', () => {
    expect(liveChassisLikely(['12AX7']).likely).toBe(false); // encyclopedia: 12AX7 runs 6.3 V parallel in AC sets
  });

  it('when British names only begin with P, U, X or H, then they are not taken for series types', () => {
    // from memory: PX4 4 V triode, U52 5 V rectifier, X65 and H63 6.3 V: a transformer set
    expect(liveChassisLikely(['X65', 'H63', 'PX4', 'U52']).likely).toBe(false);
  });

  it('when a name cannot be read, then it is reported, not ignored', () => {
    const result = liveChassisLikely(['ECH81', 'QQ7', 'EL84']);
    expect(result.unknown).toEqual(['QQ7']);
    expect(result.likely).toBe(false);
  });

  it('accepts bare heater letters', () => {
    expect(liveChassisLikely(['P']).likely).toBe(true); // code: P = 300 mA series
    expect(liveChassisLikely(['E']).likely).toBe(false); // code: E = 6.3 V parallel
  });
});
