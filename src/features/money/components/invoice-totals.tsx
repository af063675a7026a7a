import type { Money } from '../../../../shared/money/currency';
import { moneyText } from './money-text';

interface Priced {
  tax: { name: string; rateBasisPoints: number } | null;
  lines: { description: string; net: Money; tax: Money }[];
  net: Money;
  taxAmount: Money;
  gross: Money;
  deducted: Money;
  due: Money;
}

/** The lines and totals of an invoice or its preview, every amount in its own (the workshop's) currency. */
export function InvoiceTotals({
  priced,
  caption,
  dueLabel = 'Amount due',
}: {
  priced: Priced;
  caption: string;
  dueLabel?: string;
}) {
  const p = priced;
  return (
    <table className="w-full text-left">
      <caption className="sr-only">{caption}</caption>
      <thead>
        <tr className="border-b border-rule text-sm text-ink-soft">
          <th scope="col">Line</th>
          <th scope="col" className="text-right">
            Amount
          </th>
        </tr>
      </thead>
      <tbody>
        {p.lines.map((l, i) => (
          <tr key={i} className="border-b border-rule/60">
            <td className="py-1">
              {l.description}
              {l.tax.amount !== 0 && (
                <span className="ml-1 text-sm text-ink-soft">
                  ({p.tax?.name} {moneyText(l.tax)})
                </span>
              )}
            </td>
            <td className="py-1 text-right font-mono">{moneyText(l.net)}</td>
          </tr>
        ))}
      </tbody>
      <tfoot>
        <tr>
          <th scope="row" className="pt-2 font-normal">
            Net
          </th>
          <td className="pt-2 text-right font-mono">{moneyText(p.net)}</td>
        </tr>
        {p.tax && (
          <tr>
            <th scope="row" className="font-normal">
              {p.tax.name} at {p.tax.rateBasisPoints / 100}%
            </th>
            <td className="text-right font-mono">{moneyText(p.taxAmount)}</td>
          </tr>
        )}
        <tr>
          <th scope="row">Total</th>
          <td className="text-right font-mono font-bold">{moneyText(p.gross)}</td>
        </tr>
        {p.deducted.amount !== 0 && (
          <tr>
            <th scope="row" className="font-normal">
              Less deposits paid
            </th>
            <td className="text-right font-mono">{moneyText({ ...p.deducted, amount: -p.deducted.amount })}</td>
          </tr>
        )}
        <tr>
          <th scope="row">{dueLabel}</th>
          <td className="text-right font-mono text-lg font-bold">{moneyText(p.due)}</td>
        </tr>
      </tfoot>
    </table>
  );
}
