import { describe, expect, it } from 'vitest';
import {
  formatDeviation,
  formatDifference,
  formatInstant,
  formatNumber,
  formatPercent,
  formatTolerance,
  isoDate,
  MINUS,
  signedPercent,
  trueMinus,
} from '.';

// Unicode 15, U+2212 MINUS SIGN: the sign typography uses for negative numbers (not the hyphen-minus U+002D).
describe('signs and per cents', () => {
  it('when a value is negative, then it carries U+2212, never a hyphen', () => {
    expect(MINUS).toBe('\u2212');
    expect(signedPercent(-0.2)).toBe('\u221220.0 %');
    expect(formatPercent(-0.1, true)).toBe('\u221210 %');
    expect(formatNumber(-2)).toBe('\u22122');
    expect(trueMinus('-12 V')).toBe('\u221212 V');
    expect(formatDifference(-220, 'Ω')).toBe('\u2212220 Ω');
  });

  it('when a value is positive, then a plus shows only where a sign is asked for', () => {
    expect(signedPercent(0.128)).toBe('+12.8 %');
    expect(formatPercent(0.06)).toBe('6 %');
    expect(formatPercent(0.06, true)).toBe('+6 %');
    expect(formatDifference(15, 'V')).toBe('+15 V');
    expect(formatDifference(0, 'Hz')).toBe('0 Hz');
    expect(formatDifference(0, 'Hz', '+')).toBe('+0 Hz');
  });

  it('when a deviation is missing, then it reads as a dash', () => {
    expect(formatDeviation(null)).toBe('—');
    expect(formatDeviation(Number.NaN)).toBe('—');
  });

  it('when a tolerance is asymmetric, then it reads below first: −20/+50 % (IEC 60062 letter S)', () => {
    expect(formatTolerance({ minus: 0.2, plus: 0.5 })).toBe('\u221220/+50 %');
    expect(formatTolerance(0.1)).toBe('±10 %');
    expect(formatTolerance(0.0125, 4)).toBe('±1.25 %');
  });
});

describe('dates', () => {
  const instant = '2026-03-08T23:30:00Z';

  it("when the zone is ahead of UTC, then the calendar day is the zone's", () => {
    expect(isoDate(instant, 'UTC')).toBe('2026-03-08');
    expect(isoDate(instant, 'Europe/Berlin')).toBe('2026-03-09');
  });

  it("when a recent moment is listed, then it reads the locale's own way, without a padded hour", () => {
    // Expected strings from the CLDR patterns Node's Intl ships (en-GB 24-hour, en-US 12-hour clock).
    expect(formatInstant('2026-12-02T14:05:00Z', 'dayAndTime', { locale: 'en-GB', timeZone: 'UTC' })).toBe(
      '2 Dec, 14:05',
    );
    // The space before PM is U+0020 or U+202F depending on the ICU version; \s matches both.
    expect(formatInstant('2026-12-02T14:05:00Z', 'dayAndTime', { locale: 'en-US', timeZone: 'UTC' })).toMatch(
      /^Dec 2, 2:05\sPM$/,
    );
    expect(formatInstant('2026-12-02T04:05:00Z', 'dayAndTime', { locale: 'en-GB', timeZone: 'UTC' })).toBe(
      '2 Dec, 04:05',
    );
  });

  it('when a document date is asked in British English, then it reads "8 March 2026"', () => {
    expect(formatInstant(instant, 'longDate', { locale: 'en-GB', timeZone: 'UTC' })).toBe('8 March 2026');
    expect(formatInstant(instant, 'mediumDate', { locale: 'en-GB', timeZone: 'UTC' })).toBe('8 Mar 2026');
    expect(formatInstant(instant, 'time', { locale: 'en-US', timeZone: 'UTC' })).toBe('23:30');
  });

  it('when an instant cannot be read, then the text is empty', () => {
    expect(formatInstant('soon', 'dateTime')).toBe('');
    expect(isoDate('soon')).toBe('');
  });
});
