import { and, asc, desc, eq, inArray, isNotNull, isNull, ne } from 'drizzle-orm';
import type { DepositInput, Invoice } from '../../../shared/schemas/invoices';
import { shareOf } from '../../../shared/money/totals';
import type { Database, Tx } from '../../db/client';
import { estimates, events, invoiceLines, invoices, labourEntries, parts, restorations } from '../../db/schema';
import { ConflictError, NotFoundError } from '../../http/errors';
import { readWorkshopSettings } from '../workshop/workshop-settings';
import { issueInvoice } from './issue-invoice';

type Row = typeof invoices.$inferSelect;

function present(i: Row, lines: (typeof invoiceLines.$inferSelect)[]): Invoice {
  const m = (amount: number) => ({ amount, currency: i.currency });
  const status = i.voidedAt ? 'void' : i.kind === 'credit-note' ? 'credit' : i.paid >= i.due ? 'paid' : 'open';
  return {
    id: i.id, number: i.number, kind: i.kind, issuedAt: i.issuedAt.toISOString(),
    tax: i.taxRateBasisPoints === null ? null : { name: i.taxName, rateBasisPoints: i.taxRateBasisPoints },
    net: m(i.net), taxAmount: m(i.tax), gross: m(i.gross), deducted: m(i.deducted), due: m(i.due), paid: m(i.paid),
    status, creditsInvoiceId: i.creditsInvoiceId, voidReason: i.voidReason,
    lines: lines.map((l) => ({ description: l.description, net: m(l.net), tax: m(l.tax) })),
  };
}

async function lock(tx: Tx, restorationId: number) {
  const [r] = await tx.select({ id: restorations.id }).from(restorations).where(eq(restorations.id, restorationId)).for('update');
  if (!r) throw new NotFoundError();
}

/** Deposits, final invoices and credit notes. Every issue takes the next number in its own transaction. */
export function invoicesService(db: Database) {
  async function list(restorationId: number): Promise<Invoice[]> {
    const rows = await db.select().from(invoices).where(eq(invoices.restorationId, restorationId)).orderBy(desc(invoices.number));
    if (!rows.length) return [];
    const lines = await db.select().from(invoiceLines).where(inArray(invoiceLines.invoiceId, rows.map((r) => r.id))).orderBy(asc(invoiceLines.position));
    return rows.map((r) => present(r, lines.filter((l) => l.invoiceId === r.id)));
  }
  const one = async (restorationId: number, id: number) => (await list(restorationId)).find((i) => i.id === id)!;

  return {
    list,
    async restorationOf(invoiceId: number) {
      const [row] = await db.select({ restorationId: invoices.restorationId }).from(invoices).where(eq(invoices.id, invoiceId));
      return row?.restorationId;
    },

    /** A deposit request: an amount, or a share of the latest approved estimate's high figure (tax included, so no tax is added). */
    async deposit(restorationId: number, input: DepositInput, userId: number) {
      const row = await db.transaction(async (tx) => {
        await lock(tx, restorationId);
        const settings = await readWorkshopSettings(tx);
        let amount: number;
        let description = 'Deposit';
        if ('amount' in input) amount = input.amount;
        else {
          const [approved] = await tx.select().from(estimates).where(and(eq(estimates.restorationId, restorationId), eq(estimates.decision, 'approved')))
            .orderBy(desc(estimates.version)).limit(1);
          if (!approved) throw new ConflictError('No approved estimate to take a share of: ask for a fixed amount, or send an estimate first.');
          amount = shareOf(approved.highAmount, input.shareBasisPoints);
          description = `Deposit: ${input.shareBasisPoints / 100}% of estimate version ${approved.version}`;
        }
        return issueInvoice(tx, { restorationId, kind: 'deposit', lines: [{ description, priced: { kind: 'fixed', quantity: 1, unitAmount: amount } }],
          prices: { ...settings, taxRateBasisPoints: null }, userId });
      });
      return one(restorationId, row.id);
    },

    /** The final invoice: billable labour at the workshop rate, fitted parts at cost plus markup, less deposits paid. */
    async final(restorationId: number, userId: number) {
      const row = await db.transaction(async (tx) => {
        await lock(tx, restorationId);
        const [existing] = await tx.select({ number: invoices.number }).from(invoices)
          .where(and(eq(invoices.restorationId, restorationId), eq(invoices.kind, 'final'), isNull(invoices.voidedAt)));
        if (existing) throw new ConflictError(`Invoice ${existing.number} is already issued for this set: void it before issuing another.`);
        const settings = await readWorkshopSettings(tx);
        const time = await tx.select().from(labourEntries).where(and(eq(labourEntries.restorationId, restorationId), eq(labourEntries.billable, true), isNotNull(labourEntries.minutes)));
        const fitted = await tx.select().from(parts).where(and(eq(parts.restorationId, restorationId), eq(parts.state, 'fitted'), isNotNull(parts.costMinor)));
        const minutes = time.reduce((a, e) => a + (e.minutes ?? 0), 0);
        const lines = [
          ...(minutes ? [{ description: `Labour, ${Number((minutes / 60).toFixed(2))} h`, priced: { kind: 'labour' as const, minutes, hourlyRate: settings.labourRate } }] : []),
          ...fitted.map((p) => ({ description: `${p.componentRef} ${p.replacementPart} ${p.replacementRating}`.replace(/\s+/g, ' ').trim(), priced: { kind: 'part' as const, cost: p.costMinor!, markupBasisPoints: settings.partsMarkupBasisPoints } })),
        ];
        if (!lines.length) throw new ConflictError('Nothing to invoice yet: log billable time or mark parts fitted with their cost.');
        const deposits = await tx.select({ paid: invoices.paid }).from(invoices)
          .where(and(eq(invoices.restorationId, restorationId), eq(invoices.kind, 'deposit'), isNull(invoices.voidedAt)));
        return issueInvoice(tx, { restorationId, kind: 'final', lines, prices: settings, deducted: deposits.reduce((a, d) => a + d.paid, 0), userId });
      });
      return one(restorationId, row.id);
    },

    /** Voids an issued invoice or deposit request: it stays as issued, marked void, and a credit note reverses it. */
    async void(invoiceId: number, reason: string, userId: number) {
      const { restorationId, creditId } = await db.transaction(async (tx) => {
        const [i] = await tx.select().from(invoices).where(and(eq(invoices.id, invoiceId), ne(invoices.kind, 'credit-note'))).for('update');
        if (!i) throw new NotFoundError();
        if (i.voidedAt) throw new ConflictError(`Invoice ${i.number} is already void.`);
        if (i.paid > 0) throw new ConflictError(`Invoice ${i.number} has payments: refund them before voiding it.`);
        const lines = await tx.select().from(invoiceLines).where(eq(invoiceLines.invoiceId, i.id)).orderBy(asc(invoiceLines.position));
        await tx.update(invoices).set({ voidedAt: new Date(), voidReason: reason }).where(eq(invoices.id, i.id));
        await tx.insert(events).values({ restorationId: i.restorationId, kind: 'invoice-voided', actorId: userId, data: { invoiceId: i.id, number: i.number } });
        const credit = await issueInvoice(tx, {
          restorationId: i.restorationId, kind: 'credit-note', creditsInvoiceId: i.id, userId, deducted: -i.deducted,
          lines: lines.map((l) => ({ description: `Reverses: ${l.description}`, priced: { kind: 'fixed', quantity: -1, unitAmount: l.net } })),
          prices: { currency: i.currency, taxName: i.taxName, taxRateBasisPoints: i.taxRateBasisPoints, taxRounding: i.taxRounding },
        });
        return { restorationId: i.restorationId, creditId: credit.id };
      });
      return one(restorationId, creditId);
    },
  };
}
