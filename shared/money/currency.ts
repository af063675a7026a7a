/**
 * Money as Gridleak keeps it: an integer number of the currency's minor units (pence, cents, fils) with its
 * ISO 4217 code beside it. No floating-point amount is ever stored or added; only display divides.
 */

/** An amount in minor units with its currency, the shape of every amount in the API. */
export interface Money {
  amount: number;
  currency: string;
}

/** Whether the runtime's Intl knows the code as an ISO 4217 currency. */
export function isCurrencyCode(code: string): boolean {
  if (!/^[A-Z]{3}$/.test(code)) return false;
  return Intl.supportedValuesOf('currency').includes(code);
}

/** Digits after the decimal point in the currency's minor unit (ISO 4217's "minor unit" column, via Intl). */
export function minorDigits(currency: string): number {
  return new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

export function money(amount: number, currency: string): Money {
  if (!Number.isSafeInteger(amount))
    throw new RangeError(`A money amount must be a whole number of minor units, got ${amount}.`);
  return { amount, currency };
}

/** Adds amounts of one currency; mixing currencies is a programming error, never a silent conversion. */
export function sumMoney(amounts: readonly Money[], currency: string): Money {
  let total = 0;
  for (const m of amounts) {
    if (m.currency !== currency) throw new RangeError(`Cannot add ${m.currency} to ${currency}.`);
    total += m.amount;
  }
  return money(total, currency);
}

/** Formats for a person, in their locale and the amount's own currency (never a per-browser currency). */
export function formatMoney(m: Money, locale?: string): string {
  const digits = minorDigits(m.currency);
  const formatter = new Intl.NumberFormat(locale, { style: 'currency', currency: m.currency });
  // Division happens only here, for display; the digits string keeps exactness for large amounts.
  return formatter.format(`${m.amount < 0 ? '-' : ''}${decimalText(Math.abs(m.amount), digits)}` as unknown as number);
}

function decimalText(absMinor: number, digits: number): string {
  if (digits === 0) return String(absMinor);
  const s = String(absMinor).padStart(digits + 1, '0');
  return `${s.slice(0, -digits)}.${s.slice(-digits)}`;
}

/**
 * Reads an amount as a person types it ("12.50", "1,250.5", "12") into minor units, without floating point.
 * Returns null when the text is not an amount or has more decimals than the currency allows.
 */
export function parseMoney(text: string, currency: string): Money | null {
  const cleaned = text.trim().replace(/[,\s]/g, '');
  const match = /^(-?)(\d+)(?:\.(\d*))?$/.exec(cleaned);
  if (!match) return null;
  const [, sign, whole, fraction = ''] = match;
  const digits = minorDigits(currency);
  if (fraction.length > digits) return null;
  const amount = Number(whole! + fraction.padEnd(digits, '0'));
  if (!Number.isSafeInteger(amount)) return null;
  return money(sign ? -amount : amount, currency);
}
