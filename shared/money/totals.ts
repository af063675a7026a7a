import { money, type Money } from './currency';
import { divideRounded } from './rounding';
import { taxForLines, type TaxRule } from './tax';

/**
 * One priced line of an estimate bound or an invoice:
 * - labour: minutes at an hourly rate (the amount rounded half up to the minor unit);
 * - part: the ledger's cost with the workshop's markup in basis points (rounded half up);
 * - fixed: a quantity at a unit price (an extra, a deposit deducted, a credit).
 */
export type PricedLine =
  | { kind: 'labour'; minutes: number; hourlyRate: number }
  | { kind: 'part'; cost: number; markupBasisPoints: number }
  | { kind: 'fixed'; quantity: number; unitAmount: number };

/** A line's net amount in minor units. */
export function lineNet(line: PricedLine): number {
  switch (line.kind) {
    case 'labour':
      return divideRounded(line.minutes * line.hourlyRate, 60, 'half-up');
    case 'part':
      return divideRounded(line.cost * (10_000 + line.markupBasisPoints), 10_000, 'half-up');
    case 'fixed':
      return line.quantity * line.unitAmount;
  }
}

export interface Totals {
  lines: { net: Money; tax: Money }[];
  net: Money;
  tax: Money;
  gross: Money;
  /** Deposits and payments already received, deducted from what is due. */
  paid: Money;
  due: Money;
}

/** Line and invoice totals, the one place they are computed (estimates, invoices, PDFs and e-mails use it). */
export function totals(lines: readonly PricedLine[], currency: string, tax: TaxRule | null, paidMinor = 0): Totals {
  const nets = lines.map(lineNet);
  const t = taxForLines(nets, tax);
  const net = nets.reduce((a, b) => a + b, 0);
  const gross = net + t.total;
  return {
    lines: nets.map((n, i) => ({ net: money(n, currency), tax: money(t.perLine[i]!, currency) })),
    net: money(net, currency),
    tax: money(t.total, currency),
    gross: money(gross, currency),
    paid: money(paidMinor, currency),
    due: money(gross - paidMinor, currency),
  };
}

/** A share of an amount (a deposit as 30% of an estimate's high bound), in basis points, rounded half up. */
export function shareOf(amountMinor: number, basisPoints: number): number {
  return divideRounded(amountMinor * basisPoints, 10_000, 'half-up');
}
