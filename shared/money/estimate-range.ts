import type { Money } from './currency';
import { totals, type PricedLine } from './totals';
import type { TaxRule } from './tax';

/** An estimate line with a low and a high bound (labour hours as a range, parts expected, flagged extras). */
export interface RangedLine {
  low: PricedLine;
  high: PricedLine;
}

export interface EstimateRange {
  low: Money;
  high: Money;
  lines: { low: Money; high: Money }[];
}

/** The range an owner is quoted: each bound priced and taxed by the same rules as an invoice. */
export function estimateRange(lines: readonly RangedLine[], currency: string, tax: TaxRule | null): EstimateRange {
  const low = totals(
    lines.map((l) => l.low),
    currency,
    tax,
  );
  const high = totals(
    lines.map((l) => l.high),
    currency,
    tax,
  );
  return {
    low: low.gross,
    high: high.gross,
    lines: lines.map((_, i) => ({ low: low.lines[i]!.net, high: high.lines[i]!.net })),
  };
}
