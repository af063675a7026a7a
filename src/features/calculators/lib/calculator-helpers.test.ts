import { describe, expect, it } from 'vitest';
import { BAND_OPTIONS } from './band-colours';
import { esrVerdict, lineUpItems, suggestedRating } from './bench-advice';
import { preferredNeighbours } from './preferred-neighbours';
import { readTolerance } from './read-tolerance';

describe('readTolerance', () => {
  it('when a plain per cent is typed, then it is a symmetric fraction', () => {
    expect(readTolerance('10')).toEqual({ tolerance: 0.1, display: '±10 %' });
    expect(readTolerance(' ±5 % ').tolerance).toBe(0.05);
  });

  it('when an electrolytic tolerance is typed below/above, then both sides are kept', () => {
    expect(readTolerance('-20/+50').tolerance).toEqual({ minus: 0.2, plus: 0.5 });
    expect(readTolerance('−20 % / +50 %').tolerance).toEqual({ minus: 0.2, plus: 0.5 });
  });

  it('when the text is empty, then nothing is read and nothing is wrong', () => {
    expect(readTolerance('  ')).toEqual({});
  });

  it('when the text is not a per cent, then it says so in words', () => {
    expect(readTolerance('ten').error).toMatch(/not a tolerance Gridleak can read/);
    expect(readTolerance('150').error).toMatch(/more than 100 % below/);
  });
});

describe('preferredNeighbours', () => {
  // E12 decade 1.0 1.2 1.5 1.8 2.2 2.7 3.3 3.9 4.7 5.6 6.8 8.2 (IEC 60063).
  it('when 5.3 kΩ is rounded in E12, then 5.6 k sits between 4.7 k and 6.8 k', () => {
    expect(preferredNeighbours(5300, 'E12')).toEqual({ below: 4700, nearest: 5600, above: 6800 });
  });

  it('when the nearest value crosses into the next decade, then its neighbours do too', () => {
    expect(preferredNeighbours(9600, 'E12')).toEqual({ below: 8200, nearest: 10000, above: 12000 });
  });

  it('when the value is small, then the neighbours are exact decimals', () => {
    // E3 decade 1.0 2.2 4.7 (IEC 60063).
    expect(preferredNeighbours(2.1e-9, 'E3')).toEqual({ below: 1e-9, nearest: 2.2e-9, above: 4.7e-9 });
  });
});

describe('band options', () => {
  // Meanings per IEC 60062: gold ×0.1 and ±5 %, red 2 and ×100, brown 100 ppm/K.
  it('when the library is asked, then each role lists only colours that mean something there', () => {
    const digits = BAND_OPTIONS.digit.map((o) => o.name);
    expect(digits).toHaveLength(10);
    expect(digits).not.toContain('gold');
    expect(BAND_OPTIONS.digit.find((o) => o.name === 'red')?.meaning).toBe('2');
    expect(BAND_OPTIONS.multiplier.find((o) => o.name === 'red')?.meaning).toBe('×100');
    expect(BAND_OPTIONS.multiplier.find((o) => o.name === 'gold')?.meaning).toBe('×0.1');
    expect(BAND_OPTIONS.tolerance.find((o) => o.name === 'gold')?.meaning).toBe('±5 %');
    expect(BAND_OPTIONS.tempco.find((o) => o.name === 'brown')?.meaning).toBe('100 ppm/K');
  });
});

describe('bench advice', () => {
  it('when an ESR reading passes the table figure, then it is marginal up to double and out beyond', () => {
    // The rule printed with the worst-case ESR table for new electrolytics (widely circulated technicians' table,
    // reproduced at glodark.com/design/esrchart.htm): be wary of a part reading more than double the figure.
    expect(esrVerdict(0.8, 0.8)).toBe('within');
    expect(esrVerdict(1.3, 0.8)).toBe('marginal');
    expect(esrVerdict(1.7, 0.8)).toBe('out');
  });

  it('when a resistor dissipates 0.39 W, then a 1 W part is suggested (common practice: twice the dissipation)', () => {
    expect(suggestedRating(0.386)).toBe(1);
    expect(suggestedRating(100)).toBeUndefined();
  });

  it('when a line-up is typed with spaces, commas or plus signs, then each valve is one item', () => {
    expect(lineUpItems(' UCH42, UAF42 +UBC41;UL41  UY41 ')).toEqual(['UCH42', 'UAF42', 'UBC41', 'UL41', 'UY41']);
  });
});
