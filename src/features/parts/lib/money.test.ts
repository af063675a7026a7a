import { describe, expect, it } from 'vitest';
import { formatMinor, minorToText, parseCost } from './money';

describe('money', () => {
  it('formats minor units in the currency, with its own number of decimals', () => {
    expect(formatMinor(185, 'GBP', 'en-GB')).toBe('£1.85');
    expect(formatMinor(185, 'EUR', 'de-DE')).toBe('1,85\u00a0€');
    expect(formatMinor(185, 'JPY', 'en-GB')).toBe('JP¥185');
  });

  it('reads a typed cost into minor units, a decimal comma too, and refuses what it cannot read exactly', () => {
    expect(parseCost('1.85', 'GBP')).toEqual({ ok: true, minor: 185 });
    expect(parseCost('£ 1,5', 'GBP')).toEqual({ ok: true, minor: 150 });
    expect(parseCost('12', 'USD')).toEqual({ ok: true, minor: 1200 });
    expect(parseCost('', 'GBP')).toEqual({ ok: true, minor: null });
    expect(parseCost('300', 'JPY')).toEqual({ ok: true, minor: 300 });
    expect(parseCost('1.855', 'GBP')).toEqual({ ok: false, message: 'At most 2 decimal places' });
    expect(parseCost('3.5', 'JPY').ok).toBe(false);
    expect(parseCost('about two', 'GBP').ok).toBe(false);
  });

  it('writes minor units back as the figure to type', () => {
    expect(minorToText(185, 'GBP')).toBe('1.85');
    expect(minorToText(null, 'GBP')).toBe('');
    expect(minorToText(300, 'JPY')).toBe('300');
  });
});
