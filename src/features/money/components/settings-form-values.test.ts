import { describe, expect, it } from 'vitest';
import { shareBasisPoints } from './deposit-form';
import { typedMinutes } from './labour-entry-form';
import { settingsFormSchema, toFormValues, toSettings } from './settings-form-values';

const typed = {
  currency: 'gbp',
  labourRate: '42.50',
  partsMarkup: '12.5',
  taxOn: true,
  taxName: 'VAT',
  taxRate: '17.5',
  taxRounding: 'invoice-down' as const,
  estimateApprovalRequired: false,
  invoicePrefix: 'CL-',
  timeZone: 'Europe/London',
};

describe('workshop settings as typed', () => {
  it('stores typed amounts in minor units and per cents in basis points', () => {
    const s = toSettings(settingsFormSchema.parse(typed));
    // ISO 4217: pound sterling has 2 decimals, so £42.50 is 4250 p; 12.5% = 1250 basis points; 17.5% (HMRC VAT rate 1991–2008, from memory) = 1750.
    expect([s.currency, s.labourRate, s.partsMarkupBasisPoints, s.taxRateBasisPoints]).toEqual([
      'GBP',
      4250,
      1250,
      1750,
    ]);
    expect(toSettings(settingsFormSchema.parse({ ...typed, taxOn: false })).taxRateBasisPoints).toBeNull();
    expect(toFormValues(s)).toMatchObject({ labourRate: '42.50', partsMarkup: '12.5', taxRate: '17.5' });
  });

  it('reads the rate in the currency chosen: yen have no minor unit (ISO 4217)', () => {
    expect(toSettings(settingsFormSchema.parse({ ...typed, currency: 'JPY', labourRate: '6000' })).labourRate).toBe(
      6000,
    );
    expect(settingsFormSchema.safeParse({ ...typed, currency: 'JPY', labourRate: '60.5' }).success).toBe(false);
  });

  it('refuses a code that is no currency, a zone that does not exist and a tax rate above 100%', () => {
    const r = settingsFormSchema.safeParse({ ...typed, currency: 'QQQ', timeZone: 'Mars/Olympus', taxRate: '120' });
    expect(r.success ? [] : r.error.issues.map((i) => i.path[0]).sort()).toEqual(['currency', 'taxRate', 'timeZone']);
  });
});

describe('typed hours and shares', () => {
  it('turns hours into whole minutes and per cents into basis points', () => {
    expect([typedMinutes('1.25'), typedMinutes('0.1'), typedMinutes('25'), typedMinutes('two')]).toEqual([
      75,
      6,
      null,
      null,
    ]); // 1.25 h × 60; 0.1 h = 6 min; a day has 24 h
    expect([shareBasisPoints('30'), shareBasisPoints('12.5'), shareBasisPoints('0'), shareBasisPoints('101')]).toEqual([
      3000,
      1250,
      null,
      null,
    ]);
  });
});
