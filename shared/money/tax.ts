import { divideRounded, type Rounding } from './rounding';

/**
 * Where tax is rounded and how, as a workshop states it on its invoices:
 * - `invoice-down`: tax on the invoice's net total, rounded down to a whole minor unit (HMRC VAT Notice 700
 *   section 17.5 allows rounding the invoice's total VAT down to the whole penny).
 * - `invoice-half-up`: tax on the net total, to the nearest minor unit, a half rounded up (the ATO's GST rule).
 * - `line-half-up`: tax on each line, to the nearest minor unit, a half up; the invoice's tax is their sum
 *   (HMRC's line-by-line calculation rounded to the nearest penny).
 */
export const taxRoundings = ['invoice-down', 'invoice-half-up', 'line-half-up'] as const;
export type TaxRounding = (typeof taxRoundings)[number];

export const taxRoundingLabels: Record<TaxRounding, string> = {
  'invoice-down': 'On the invoice total, rounded down to the whole minor unit',
  'invoice-half-up': 'On the invoice total, to the nearest minor unit (a half rounds up)',
  'line-half-up': 'On each line, to the nearest minor unit (a half rounds up)',
};

/** A tax the workshop charges: its name on the invoice ("VAT"), the rate in basis points (20% = 2000). */
export interface TaxRule {
  name: string;
  rateBasisPoints: number;
  rounding: TaxRounding;
}

/** Tax on a net amount in minor units, rounded as stated. */
export function taxOn(netMinor: number, rateBasisPoints: number, rounding: Rounding): number {
  if (!Number.isSafeInteger(rateBasisPoints) || rateBasisPoints < 0)
    throw new RangeError('A tax rate is whole basis points, 0 or more.');
  return divideRounded(netMinor * rateBasisPoints, 10_000, rounding);
}

/** Tax per line (0 unless the rule rounds per line) and the invoice's tax, from the lines' net amounts. */
export function taxForLines(netLines: readonly number[], rule: TaxRule | null): { perLine: number[]; total: number } {
  if (!rule) return { perLine: netLines.map(() => 0), total: 0 };
  if (rule.rounding === 'line-half-up') {
    const perLine = netLines.map((n) => taxOn(n, rule.rateBasisPoints, 'half-up'));
    return { perLine, total: perLine.reduce((a, b) => a + b, 0) };
  }
  const net = netLines.reduce((a, b) => a + b, 0);
  return {
    perLine: netLines.map(() => 0),
    total: taxOn(net, rule.rateBasisPoints, rule.rounding === 'invoice-down' ? 'down' : 'half-up'),
  };
}
