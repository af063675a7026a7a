import type { Part } from '../../../../shared/schemas/parts';
import { Button } from '../../../components/button';
import { EmptyState } from '../../../components/states';
import { printAlone } from '../lib/print-alone';
import { shoppingLines, type ShoppingLine } from '../lib/shopping-list';
import { formatLongDate } from '../../../lib/format';

export interface ShoppingListProps {
  parts: Part[];
  /** Names the set on the printed sheet, e.g. "Make Model". */
  setName: string;
}

const today = () => formatLongDate(new Date());

function Lines({ heading, lines }: { heading: string; lines: ShoppingLine[] }) {
  if (lines.length === 0) return null;
  const showSources = lines.some((l) => l.sources.length > 0);
  return (
    <section className="break-inside-avoid space-y-1" aria-label={heading}>
      <h3 className="font-bold">{heading}</h3>
      <table className="w-full border-collapse text-left text-sm print:text-xs">
        <thead className="border-b-2 border-rule">
          <tr>
            <th scope="col" className="w-8 py-1">
              <span className="sr-only">Got it</span>
            </th>
            <th scope="col" className="py-1 pr-3 text-right">
              Qty
            </th>
            <th scope="col" className="py-1 pr-3">
              Part
            </th>
            <th scope="col" className="py-1 pr-3">
              Rating
            </th>
            <th scope="col" className="py-1 pr-3">
              For
            </th>
            {showSources && (
              <th scope="col" className="py-1">
                Source
              </th>
            )}
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {lines.map((l) => (
            <tr key={`${l.part}|${l.rating}|${l.refs.join()}`}>
              <td aria-hidden="true" className="py-1 text-lg leading-none">
                ☐
              </td>
              <td className="py-1 pr-3 text-right font-mono font-semibold">{l.quantity}</td>
              <td className="py-1 pr-3">
                {l.part || (l.rating ? '' : <em className="text-ink-soft">not chosen yet</em>)}
              </td>
              <td className="py-1 pr-3">
                <span className="font-mono">{l.rating}</span>
                {l.danger && (
                  <strong className="ml-2 whitespace-nowrap text-danger">
                    <span aria-hidden="true">⚠ </span>Danger: check the ledger
                  </strong>
                )}
              </td>
              <td className="py-1 pr-3 font-mono">{l.refs.join(', ')}</td>
              {showSources && <td className="py-1">{l.sources.join('; ')}</td>}
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}

/**
 * What to buy: the planned parts, then those already on order, one line per replacement part and rating with the
 * total quantity and the references it is for. "Print" prints this sheet alone, on one page.
 */
export function ShoppingList({ parts, setName }: ShoppingListProps) {
  const toOrder = shoppingLines(parts, 'planned');
  const onOrder = shoppingLines(parts, 'ordered');
  const empty = toOrder.length === 0 && onOrder.length === 0;
  return (
    <div className={`space-y-4 ${printAlone}`}>
      <div className="flex flex-wrap items-center justify-between gap-3 print:hidden">
        <p className="text-sm text-ink-soft">
          Parts planned or on order, grouped by what to buy. Parts kept or removed are left out.
        </p>
        <Button onClick={() => window.print()} disabled={empty}>
          Print
        </Button>
      </div>
      <article
        aria-labelledby="shopping-heading"
        className="space-y-3 rounded-xl border border-rule bg-panel p-4 print:rounded-none print:border-0 print:p-0"
      >
        <header>
          <h2 id="shopping-heading" className="text-lg font-bold">
            Shopping list
          </h2>
          <p className="text-sm text-ink-soft">
            {setName} · {today()}
          </p>
        </header>
        {empty ? (
          <EmptyState title="Nothing to buy">
            No parts are planned or on order. Plan a replacement in the ledger and it shows here.
          </EmptyState>
        ) : (
          <>
            <Lines heading="To order" lines={toOrder} />
            <Lines heading="On order" lines={onOrder} />
            <p className="text-xs text-ink-soft">
              Never a lower voltage rating than the part it replaces; where the mains connects, new X- or Y-class safety
              capacitors only. Follow local codes and licensed practice.
            </p>
          </>
        )}
      </article>
    </div>
  );
}
