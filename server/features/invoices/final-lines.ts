import type { WorkshopSettings } from '../../../shared/schemas/estimates';
import type { InvoicePreview } from '../../../shared/schemas/invoices';
import { totals, type PricedLine } from '../../../shared/money/totals';
import type { Executor } from '../../db/client';
import { taxRuleOf } from '../workshop/workshop-settings';
import { invoicesRepo } from './invoices.repo';

export interface DraftLine {
  description: string;
  priced: PricedLine;
}

/**
 * What a final invoice would hold now: billable labour from the log at the workshop rate, fitted parts from the
 * ledger at cost plus the workshop's markup, and the deposits paid so far (deducted from what is due).
 */
export async function finalLines(
  db: Executor,
  restorationId: number,
  settings: WorkshopSettings,
): Promise<{ lines: DraftLine[]; deducted: number }> {
  const repo = invoicesRepo(db);
  const time = await repo.billableMinutes(restorationId);
  const fitted = await repo.fittedParts(restorationId);
  const minutes = time.reduce((a, e) => a + (e.minutes ?? 0), 0);
  const lines: DraftLine[] = [
    ...(minutes
      ? [
          {
            description: `Labour, ${Number((minutes / 60).toFixed(2))} h`,
            priced: { kind: 'labour' as const, minutes, hourlyRate: settings.labourRate },
          },
        ]
      : []),
    ...fitted.map((p) => ({
      description:
        `${p.componentRef} ${p.replacementPart} ${p.replacementRating}${p.quantity > 1 ? ` × ${p.quantity}` : ''}`
          .replace(/\s+/g, ' ')
          .trim(),
      priced: { kind: 'part' as const, cost: p.costMinor!, markupBasisPoints: settings.partsMarkupBasisPoints },
    })),
  ];
  const deposits = await repo.depositsPaid(restorationId);
  return { lines, deducted: deposits.reduce((a, d) => a + d.paid, 0) };
}

/** The draft priced by the one totals function, every amount in the workshop's currency. */
export function previewOf(draft: { lines: DraftLine[]; deducted: number }, settings: WorkshopSettings): InvoicePreview {
  const rule = taxRuleOf(settings);
  const t = totals(
    draft.lines.map((l) => l.priced),
    settings.currency,
    rule,
    draft.deducted,
  );
  return {
    tax: rule && { name: rule.name, rateBasisPoints: rule.rateBasisPoints },
    lines: draft.lines.map((l, i) => ({ description: l.description, net: t.lines[i]!.net, tax: t.lines[i]!.tax })),
    net: t.net,
    taxAmount: t.tax,
    gross: t.gross,
    deducted: t.paid,
    due: t.due,
  };
}
