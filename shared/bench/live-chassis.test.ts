import { describe, expect, it } from 'vitest';
import { liveChassisLikely } from './index';

// Series heaters across the mains mean an AC/DC set with a live chassis (restorers' forum and
// test-gear manual, BENCH-REFERENCE §10; TRADE.md §6: "U/P-series or 12/35/50 V line-up").

describe('liveChassisLikely', () => {
  it('flags a U-series Rimlock line-up', () => {
    const result = liveChassisLikely(['UCH42', 'UAF42', 'UBC41', 'UL41', 'UY41']);
    expect(result.likely).toBe(true); // designation: U = 100 mA series heater
    expect(result.reasons).toHaveLength(5); // every valve is a series type
  });

  it('does not flag the usual 6.3 V noval AM/FM line-up', () => {
    // two German restoration pages: ECC85 ECH81 EF89 EABC80 EL84 EM80 (+ rectifier), all 6.3 V
    expect(liveChassisLikely(['ECC85', 'ECH81', 'EF89', 'EABC80', 'EL84', 'EM80', 'EZ80']).likely).toBe(false);
  });

  it('flags a 12/35/50 V American chain by its 35 and 50 V valves', () => {
    // common practice, no source: the five-valve American AC/DC line-up
    const result = liveChassisLikely(['12BE6', '12BA6', '12AV6', '50C5', '35W4']);
    expect(result.likely).toBe(true);
    expect(result.reasons).toHaveLength(2); // RETMA: 12 V types also run in AC sets, so only 50C5 and 35W4 count
  });

  it('does not flag a 12AX7 alone', () => {
    expect(liveChassisLikely(['12AX7']).likely).toBe(false); // encyclopedia: 12AX7 runs 6.3 V parallel in AC sets
  });

  it('accepts bare heater letters', () => {
    expect(liveChassisLikely(['P']).likely).toBe(true); // designation: P = 300 mA series
    expect(liveChassisLikely(['E']).likely).toBe(false); // designation: E = 6.3 V parallel
  });
});
