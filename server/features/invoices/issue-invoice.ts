import { eq, sql } from 'drizzle-orm';
import type { WorkshopSettings } from '../../../shared/schemas/estimates';
import { totals, type PricedLine } from '../../../shared/money/totals';
import type { Tx } from '../../db/client';
import { events, invoiceCounters, invoiceLines, invoices } from '../../db/schema';
import { readWorkshopSettings, taxRuleOf } from '../workshop/workshop-settings';

/**
 * The next invoice number, gap-free: the counter row is updated inside the issuing transaction, so it stays
 * locked until the invoice commits, and a rollback gives the number back. A second issue at the same moment
 * waits on the row lock and, under READ COMMITTED, increments the value the first one committed.
 */
async function nextNumber(tx: Tx): Promise<number> {
  await tx.insert(invoiceCounters).values({ id: 1, last: 0 }).onConflictDoNothing();
  const [row] = await tx
    .update(invoiceCounters)
    .set({ last: sql`${invoiceCounters.last} + 1` })
    .where(eq(invoiceCounters.id, 1))
    .returning();
  return row!.last;
}

export interface IssueInput {
  restorationId: number;
  kind: (typeof invoices.$inferInsert)['kind'];
  lines: { description: string; priced: PricedLine }[];
  prices: Pick<WorkshopSettings, 'currency' | 'taxName' | 'taxRateBasisPoints' | 'taxRounding'>;
  deducted?: number;
  creditsInvoiceId?: number;
  userId: number;
}

/** Issues an invoice, deposit request or credit note with its number, lines and history line, on the caller's transaction. */
export async function issueInvoice(tx: Tx, input: IssueInput) {
  const t = totals(
    input.lines.map((l) => l.priced),
    input.prices.currency,
    taxRuleOf(input.prices),
    input.deducted ?? 0,
  );
  const { invoicePrefix } = await readWorkshopSettings(tx);
  const number = await nextNumber(tx);
  const [row] = await tx
    .insert(invoices)
    .values({
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
    })
    .returning();
  await tx.insert(invoiceLines).values(
    input.lines.map((l, position) => ({
      invoiceId: row!.id,
      position,
      description: l.description,
      net: t.lines[position]!.net.amount,
      tax: t.lines[position]!.tax.amount,
    })),
  );
  await tx.insert(events).values({
    restorationId: input.restorationId,
    kind: 'invoice-issued',
    actorId: input.userId,
    data: { invoiceId: row!.id, number, reference: `${invoicePrefix}${number}`, kind: input.kind },
  });
  return row!;
}
