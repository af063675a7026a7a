import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { preferredValue, seriesValues } from './index';

// Lists per IEC 60063 (the E-series encyclopedia article, an amateur-radio club's reproduction of the lists and the EN 60063 abstract agree).
const IEC_E24 = [
  1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2,
  9.1,
];
const IEC_E12 = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];

/** Rounds 10^(k/n) to three significant figures with mathjs (IEC 60063 construction for E48 and up). */
function geometric(k: number, n: number): number {
  return Number(math.format(math.evaluate(`10^(${k}/${n})`) as number, { precision: 3 }));
}

describe('seriesValues returns the literal IEC 60063 tables', () => {
  it('has 4.3, not 4.2, in E24', () => {
    expect(seriesValues('E24')).toContain(4.3); // IEC 60063 (one encyclopedia mirror wrongly prints 4.2)
    expect(seriesValues('E24')).not.toContain(4.2); // IEC 60063
  });

  it('keeps the E24 values that rounding would not give', () => {
    // mathjs: 10^(15/24) = 4.217 rounds to 4.2, yet IEC 60063 lists 4.3
    expect(Number(math.format(math.evaluate('10^(15/24)') as number, { precision: 2 }))).toBe(4.2);
    expect(seriesValues('E24')[15]).toBe(4.3); // IEC 60063
  });

  it('matches the published E24, E12, E6 and E3 lists', () => {
    expect(seriesValues('E24')).toEqual(IEC_E24); // IEC 60063
    expect(seriesValues('E12')).toEqual(IEC_E12); // IEC 60063
    expect(seriesValues('E6')).toEqual([1.0, 1.5, 2.2, 3.3, 4.7, 6.8]); // IEC 60063
    expect(seriesValues('E3')).toEqual([1.0, 2.2, 4.7]); // IEC 60063
  });

  it('makes E6 every other E12 value and E12 every other E24 value', () => {
    expect(seriesValues('E6')).toEqual(IEC_E12.filter((_, i) => i % 2 === 0)); // IEC 60063 structure
    expect(seriesValues('E12')).toEqual(IEC_E24.filter((_, i) => i % 2 === 0)); // IEC 60063 structure
  });

  it('starts E48 with the published three-figure values', () => {
    // IEC 60063 via an amateur-radio club's reproduction of the lists
    expect(seriesValues('E48').slice(0, 12)).toEqual([
      1.0, 1.05, 1.1, 1.15, 1.21, 1.27, 1.33, 1.4, 1.47, 1.54, 1.62, 1.69,
    ]);
    expect(seriesValues('E48')).toHaveLength(48); // IEC 60063: 48 values a decade
  });

  it('gives E48 and E96 as 10^(k/n) rounded to three figures', () => {
    // IEC 60063: E48 and E96 are the rounded geometric series (the one exception, 9.20, is in E192)
    expect(seriesValues('E48')).toEqual(Array.from({ length: 48 }, (_, k) => geometric(k, 48)));
    expect(seriesValues('E96')).toEqual(Array.from({ length: 96 }, (_, k) => geometric(k, 96)));
  });

  it('makes E48 every other E96 value', () => {
    expect(seriesValues('E48')).toEqual(seriesValues('E96').filter((_, i) => i % 2 === 0)); // IEC 60063 structure
  });

  it('hands out a copy, so a caller cannot spoil the table', () => {
    const copy = seriesValues('E12');
    copy[0] = 99;
    expect(seriesValues('E12')[0]).toBe(1.0); // IEC 60063: E12 starts at 1.0
  });

  it('refuses an unknown series by listing the known ones', () => {
    // @ts-expect-error: a wrong series name arriving from untyped input
    expect(() => seriesValues('E7')).toThrow(
      /'E7' is not a preferred-value series; use one of E3, E6, E12, E24, E48, E96/,
    ); // IEC 60063 series names
  });
});

describe('preferredValue picks the nearest preferred value by ratio', () => {
  it('rounds 4.2 kΩ to 4.3 kΩ in E24', () => {
    expect(preferredValue(4200, 'E24')).toBe(4300); // IEC 60063 E24 has 4.3; ln(4.3/4.2) < ln(4.2/3.9)
  });

  it('crosses a decade edge: 9.6 kΩ goes to 10 kΩ in E12', () => {
    expect(preferredValue(9600, 'E12')).toBe(10e3); // IEC 60063 E12: 8.2 then 10
  });

  it('uses the geometric, not the arithmetic, midpoint between neighbours', () => {
    // mathjs: sqrt(4700*5600) = 5130, so 5140 is nearer 5.6 k by ratio though nearer 4.7 k by difference
    expect(math.evaluate('sqrt(4700*5600)') as number).toBeLessThan(5140);
    expect(preferredValue(5140, 'E12')).toBe(5600); // IEC 60063 E12 neighbours 4.7 and 5.6
  });

  it('leaves a preferred value as it is', () => {
    expect(preferredValue(470, 'E12')).toBe(470); // IEC 60063 E12 contains 4.7
    expect(preferredValue(0.0001, 'E6')).toBe(0.0001); // IEC 60063 E6 contains 1.0
  });

  it('refuses zero', () => {
    expect(() => preferredValue(0, 'E12')).toThrow(/above zero/); // Gridleak's own message (not a computation)
  });
});
