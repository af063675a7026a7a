import { formatMoney } from '../../../shared/money/currency';
import { formatInstant } from '../../../shared/format';

/**
 * How amounts and dates read in the workshop's e-mails and PDFs: British English conventions (£1,234.56,
 * 2 December 2026), always in the amount's own currency and the reader's (or the workshop's) time zone.
 */
export const documentMoney = (amount: number, currency: string) => formatMoney({ amount, currency }, 'en-GB');

export const documentDate = (instant: Date, timeZone: string) =>
  formatInstant(instant, 'longDate', { locale: 'en-GB', timeZone });
