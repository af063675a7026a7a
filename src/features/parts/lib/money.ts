import { formatMoney, minorDigits } from '../../../../shared/money';

/** An ISO 4217 code: the ledger stores minor units, shown in the workshop's currency (its settings). */
export type Currency = string;

/** A cost in minor units (185) as money in the reader's locale (£1.85). */
export const formatMinor = (minor: number, currency: Currency, locale?: string): string =>
  formatMoney({ amount: minor, currency }, locale);

/** Minor units back to the figure a person types: 185 → "1.85". */
export const minorToText = (minor: number | null, currency: Currency): string =>
  minor === null ? '' : (minor / 10 ** minorDigits(currency)).toFixed(minorDigits(currency));

/**
 * A typed cost ("1.85", "£1.85", "1,85", "12") in minor units; '' is no cost (null). A decimal comma is read as a
 * point; more decimals than the currency has is refused rather than rounded away.
 */
export function parseCost(
  text: string,
  currency: Currency,
): { ok: true; minor: number | null } | { ok: false; message: string } {
  const bare = text.replace(/[^\d.,-]/g, '');
  if (text.trim() === '') return { ok: true, minor: null };
  const digits = minorDigits(currency);
  const match = /^(\d+)(?:[.,](\d*))?$/.exec(bare);
  if (!match) return { ok: false, message: 'Write the cost as a number, e.g. 0.55' };
  const fraction = match[2] ?? '';
  if (fraction.length > digits)
    return {
      ok: false,
      message:
        digits === 0 ? `${currency} has no smaller unit: give a whole number` : `At most ${digits} decimal places`,
    };
  return { ok: true, minor: Number(match[1]) * 10 ** digits + Number(fraction.padEnd(digits, '0') || 0) };
}
