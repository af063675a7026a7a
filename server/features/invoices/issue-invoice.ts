import type { WorkshopSettings } from '../../../shared/schemas/estimates';
import { totals, type PricedLine } from '../../../shared/money/totals';
import type { Tx } from '../../db/client';
import { recordEvent } from '../events/record-event';
import { readWorkshopSettings, taxRuleOf } from '../workshop/workshop-settings';
import { invoicesRepo, type InvoiceRow } from './invoices.repo';

export interface IssueInput {
  restorationId: number;
  kind: InvoiceRow['kind'];
  lines: { description: string; priced: PricedLine }[];
  prices: Pick<WorkshopSettings, 'currency' | 'taxName' | 'taxRateBasisPoints' | 'taxRounding'>;
  deducted?: number;
  creditsInvoiceId?: number;
  userId: number;
}

/**
 * Issues an invoice, deposit request or credit note with its number, lines and history line, on the caller's
 * transaction: the gap-free counter is taken here, so it stays locked until that transaction ends.
 */
export async function issueInvoice(tx: Tx, input: IssueInput) {
  const t = totals(
    input.lines.map((l) => l.priced),
    input.prices.currency,
    taxRuleOf(input.prices),
    input.deducted ?? 0,
  );
  const { invoicePrefix } = await readWorkshopSettings(tx);
  const repo = invoicesRepo(tx);
  const number = await repo.nextNumber();
  const row = await repo.insert({
    restorationId: input.restorationId,
    number,
    numberPrefix: invoicePrefix,
    kind: input.kind,
    currency: input.prices.currency,
    taxName: input.prices.taxName,
    taxRateBasisPoints: input.prices.taxRateBasisPoints,
    taxRounding: input.prices.taxRounding,
    net: t.net.amount,
    tax: t.tax.amount,
    gross: t.gross.amount,
    deducted: t.paid.amount,
    due: t.due.amount,
    creditsInvoiceId: input.creditsInvoiceId ?? null,
    issuedById: input.userId,
  });
  await repo.insertLines(
    input.lines.map((l, position) => ({
      invoiceId: row.id,
      position,
      description: l.description,
      net: t.lines[position]!.net.amount,
      tax: t.lines[position]!.tax.amount,
    })),
  );
  await recordEvent(tx, {
    restorationId: input.restorationId,
    kind: 'invoice-issued',
    actorId: input.userId,
    data: { invoiceId: row.id, number, reference: `${invoicePrefix}${number}`, kind: input.kind },
  });
  return row;
}
