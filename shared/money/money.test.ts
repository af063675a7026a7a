import { describe, expect, it } from 'vitest';
import {
  estimateRange,
  formatMoney,
  isCurrencyCode,
  lineNet,
  minorDigits,
  parseMoney,
  shareOf,
  sumMoney,
  taxOn,
  totals,
  type TaxRule,
} from './index';

// Sources named beside each check. HMRC: "VAT Notice 700: the VAT guide", section 17.5 "Rounding" (from memory):
// VAT on an invoice's total may be rounded down to the whole penny; VAT worked per line is rounded to the nearest
// penny, a half penny rounded up. ATO: GST rounding for a tax invoice (from memory): to the nearest cent, 0.5 c up.
const ukVat: TaxRule = { name: 'VAT', rateBasisPoints: 2000, rounding: 'invoice-down' };
const ukVatPerLine: TaxRule = { name: 'VAT', rateBasisPoints: 2000, rounding: 'line-half-up' };
const auGst: TaxRule = { name: 'GST', rateBasisPoints: 1000, rounding: 'invoice-half-up' };

describe('currencies follow ISO 4217', () => {
  it('gives each currency its minor unit', () => {
    expect(minorDigits('GBP')).toBe(2); // ISO 4217: pound sterling, minor unit 2
    expect(minorDigits('JPY')).toBe(0); // ISO 4217: yen, minor unit 0
    expect(minorDigits('BHD')).toBe(3); // ISO 4217: Bahraini dinar, minor unit 3
  });

  it('accepts only three-letter codes Intl knows', () => {
    expect(isCurrencyCode('EUR')).toBe(true); // ISO 4217: euro
    expect(isCurrencyCode('eur')).toBe(false); // ISO 4217 codes are upper-case letters
    expect(isCurrencyCode('XYZW')).toBe(false); // ISO 4217 codes have three letters
  });
});

describe('formatMoney writes amounts the way the locale does (Unicode CLDR data)', () => {
  it('writes pence as pounds for a British reader', () => {
    expect(formatMoney({ amount: 123456, currency: 'GBP' }, 'en-GB')).toBe('£1,234.56'); // CLDR en-GB currency pattern
  });

  it('writes euros the German way', () => {
    expect(formatMoney({ amount: 123456, currency: 'EUR' }, 'de-DE')).toBe('1.234,56\u00a0€'); // CLDR de currency pattern
  });

  it('writes yen without decimals and a negative with its sign', () => {
    expect(formatMoney({ amount: 1500, currency: 'JPY' }, 'en-US')).toBe('¥1,500'); // CLDR en, ISO 4217 minor unit 0
    expect(formatMoney({ amount: -250, currency: 'GBP' }, 'en-GB')).toBe('-£2.50'); // CLDR en-GB negative pattern
  });

  it('keeps every digit of the largest safe amount', () => {
    // 2^53 − 1 pence, written out by hand: 90,071,992,547,409.91 pounds
    expect(formatMoney({ amount: Number.MAX_SAFE_INTEGER, currency: 'GBP' }, 'en-GB')).toBe('£90,071,992,547,409.91');
  });
});

describe('parseMoney reads typed amounts without floating point', () => {
  it('turns typed amounts into minor units', () => {
    expect(parseMoney('12.5', 'GBP')).toEqual({ amount: 1250, currency: 'GBP' }); // £12.50 = 1250 p
    expect(parseMoney('1,250', 'JPY')).toEqual({ amount: 1250, currency: 'JPY' }); // ISO 4217: yen has no minor unit
    expect(parseMoney('0.105', 'BHD')).toEqual({ amount: 105, currency: 'BHD' }); // ISO 4217: 1000 fils to the dinar
    expect(parseMoney('0.29', 'GBP')).toEqual({ amount: 29, currency: 'GBP' }); // 0.29 × 100 is 28.999… in binary floating point
  });

  it('refuses more decimals than the currency has, and text that is no amount', () => {
    expect(parseMoney('12.345', 'GBP')).toBeNull(); // ISO 4217: pound sterling has 2 decimals
    expect(parseMoney('12 pounds', 'GBP')).toBeNull();
  });
});

describe('tax rounding follows the authority the workshop names', () => {
  it('rounds the VAT on an invoice total down to the penny (HMRC VAT Notice 700 §17.5, from memory)', () => {
    // £10.99 × 20% = 219.8 p → rounded down 219 p
    expect(totals([{ kind: 'fixed', quantity: 1, unitAmount: 1099 }], 'GBP', ukVat).tax.amount).toBe(219);
  });

  it('rounds VAT per line to the nearest penny, a half up (HMRC VAT Notice 700 §17.5, from memory)', () => {
    // 99 p × 20% = 19.8 p → 20 p; £1.99 × 20% = 39.8 p → 40 p; invoice VAT 60 p (the invoice-total rule gives 59 p)
    const lines = [
      { kind: 'fixed', quantity: 1, unitAmount: 99 },
      { kind: 'fixed', quantity: 1, unitAmount: 199 },
    ] as const;
    expect(totals(lines, 'GBP', ukVatPerLine).tax.amount).toBe(60);
    expect(totals(lines, 'GBP', ukVatPerLine).lines.map((l) => l.tax.amount)).toEqual([20, 40]);
    expect(totals(lines, 'GBP', ukVat).tax.amount).toBe(59);
  });

  it('rounds an exact half penny up, and down only under the round-down rule', () => {
    // 17.5%, the UK standard rate 1991–2008 and 2010 (HMRC rate history, from memory): £1.00 → 17.5 p
    expect(taxOn(100, 1750, 'half-up')).toBe(18);
    expect(taxOn(100, 1750, 'down')).toBe(17);
  });

  it('rounds GST to the nearest cent with half a cent up (ATO GST rounding rule, from memory)', () => {
    // A$0.45 × 10% = 4.5 c → 5 c; A$12.34 × 10% = 123.4 c → 123 c
    expect(totals([{ kind: 'fixed', quantity: 1, unitAmount: 45 }], 'AUD', auGst).tax.amount).toBe(5);
    expect(totals([{ kind: 'fixed', quantity: 1, unitAmount: 1234 }], 'AUD', auGst).gross.amount).toBe(1357);
  });

  it('mirrors the rounding for a credit note, so it cancels its invoice exactly', () => {
    // −£10.99 × 20% = −219.8 p → −219 p, the negative of the invoice's 219 p
    expect(totals([{ kind: 'fixed', quantity: -1, unitAmount: 1099 }], 'GBP', ukVat).tax.amount).toBe(-219);
  });

  it('charges no tax when the workshop has none', () => {
    expect(totals([{ kind: 'fixed', quantity: 2, unitAmount: 1099 }], 'GBP', null).gross.amount).toBe(2198); // 2 × £10.99
  });
});

describe('line totals', () => {
  it('prices labour by the minute at the hourly rate, to the nearest minor unit', () => {
    expect(lineNet({ kind: 'labour', minutes: 90, hourlyRate: 4200 })).toBe(6300); // 1.5 h × £42 = £63.00
    expect(lineNet({ kind: 'labour', minutes: 50, hourlyRate: 4000 })).toBe(3333); // 50/60 × £40 = £33.333… → £33.33
    expect(lineNet({ kind: 'labour', minutes: 1, hourlyRate: 30 })).toBe(1); // 1/60 × 30 p = 0.5 p → 1 p (half up)
  });

  it('adds the markup to a part’s cost', () => {
    expect(lineNet({ kind: 'part', cost: 199, markupBasisPoints: 2500 })).toBe(249); // £1.99 + 25% = 248.75 p → 249 p
  });

  it('deducts what was paid from what is due', () => {
    // £100 labour + 20% VAT = £120; a £36 deposit paid leaves £84
    const t = totals([{ kind: 'fixed', quantity: 1, unitAmount: 10000 }], 'GBP', ukVat, 3600);
    expect([t.net.amount, t.tax.amount, t.gross.amount, t.due.amount]).toEqual([10000, 2000, 12000, 8400]);
  });

  it('takes a deposit as a share of an amount', () => {
    expect(shareOf(12345, 3000)).toBe(3704); // 30% of £123.45 = 3703.5 p → 3704 p (half up)
  });

  it('never adds two currencies', () => {
    expect(() =>
      sumMoney(
        [
          { amount: 1, currency: 'GBP' },
          { amount: 1, currency: 'EUR' },
        ],
        'GBP',
      ),
    ).toThrow(/EUR/);
  });
});

describe('estimate ranges', () => {
  it('prices each bound with the invoice rules', () => {
    // Labour 2–4 h at £40, a part £10–£15 cost with 20% markup, VAT 20% on the total rounded down:
    // low  £80 + £12 = £92 + £18.40 = £110.40; high £160 + £18 = £178 + £35.60 = £213.60
    const range = estimateRange(
      [
        {
          low: { kind: 'labour', minutes: 120, hourlyRate: 4000 },
          high: { kind: 'labour', minutes: 240, hourlyRate: 4000 },
        },
        {
          low: { kind: 'part', cost: 1000, markupBasisPoints: 2000 },
          high: { kind: 'part', cost: 1500, markupBasisPoints: 2000 },
        },
      ],
      'GBP',
      ukVat,
    );
    expect([range.low.amount, range.high.amount]).toEqual([11040, 21360]);
    expect(range.lines.map((l) => [l.low.amount, l.high.amount])).toEqual([
      [8000, 16000],
      [1200, 1800],
    ]);
  });
});
