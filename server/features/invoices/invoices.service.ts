import type { DepositInput, Invoice, InvoicePreview } from '../../../shared/schemas/invoices';
import { amountLeft, invoiceStatus } from '../../../shared/money/invoice-status';
import { shareOf } from '../../../shared/money/totals';
import type { AppDeps } from '../../app-deps';
import { unitOfWork } from '../../db/unit-of-work';
import { ConflictError, NotFoundError } from '../../http/errors';
import { recordEvent } from '../events/record-event';
import { lockRestoration } from '../restorations/lock-restoration';
import { readWorkshopSettings } from '../workshop/workshop-settings';
import { finalLines, previewOf } from './final-lines';
import { referenceOf } from './invoice-document';
import { mailInvoice } from './invoice-mail';
import { invoicesRepo, type InvoiceLineRow, type InvoiceRow as Row } from './invoices.repo';
import { issueInvoice } from './issue-invoice';

type Deps = Pick<AppDeps, 'db' | 'mailer' | 'config'>;

function present(i: Row, lines: InvoiceLineRow[]): Invoice {
  const m = (amount: number) => ({ amount, currency: i.currency });
  const figures = { kind: i.kind, voided: i.voidedAt !== null, due: i.due, paid: i.paid, refunded: i.refunded };
  return {
    id: i.id,
    number: i.number,
    reference: referenceOf(i),
    kind: i.kind,
    issuedAt: i.issuedAt.toISOString(),
    tax: i.taxRateBasisPoints === null ? null : { name: i.taxName, rateBasisPoints: i.taxRateBasisPoints },
    net: m(i.net),
    taxAmount: m(i.tax),
    gross: m(i.gross),
    deducted: m(i.deducted),
    due: m(i.due),
    paid: m(i.paid),
    refunded: m(i.refunded),
    left: m(amountLeft(figures)),
    status: invoiceStatus(figures),
    creditsInvoiceId: i.creditsInvoiceId,
    voidReason: i.voidReason,
    lines: lines.map((l) => ({ description: l.description, net: m(l.net), tax: m(l.tax) })),
  };
}

/**
 * Deposits, final invoices and credit notes. Each issue takes the next number and e-mails the owner its PDF in
 * one transaction (the mail is the last step: a refusal rolls the issue back and gives the number back).
 */
export function invoicesService(deps: Deps) {
  const { db } = deps;
  const repo = invoicesRepo(db);
  async function list(restorationId: number): Promise<Invoice[]> {
    const rows = await repo.list(restorationId);
    if (!rows.length) return [];
    const lines = await repo.linesOf(rows.map((r) => r.id));
    return rows.map((r) =>
      present(
        r,
        lines.filter((l) => l.invoiceId === r.id),
      ),
    );
  }
  const one = async (restorationId: number, id: number) => (await list(restorationId)).find((i) => i.id === id)!;

  return {
    list,
    async restorationOf(invoiceId: number) {
      return repo.restorationOf(invoiceId);
    },

    /** A deposit request: an amount, or a share of the latest approved estimate's high figure (tax included, so no tax is added). */
    async deposit(restorationId: number, input: DepositInput, userId: number) {
      const row = await unitOfWork(db, async (tx) => {
        await lockRestoration(tx, restorationId);
        const settings = await readWorkshopSettings(tx);
        let amount: number;
        let description = 'Deposit';
        if ('amount' in input) amount = input.amount;
        else {
          const approved = await invoicesRepo(tx).latestApprovedEstimate(restorationId);
          if (!approved)
            throw new ConflictError(
              'No approved estimate to take a share of: ask for a fixed amount, or send an estimate first.',
            );
          amount = shareOf(approved.highAmount, input.shareBasisPoints);
          description = `Deposit: ${input.shareBasisPoints / 100}% of estimate version ${approved.version}`;
        }
        const issued = await issueInvoice(tx, {
          restorationId,
          kind: 'deposit',
          lines: [{ description, priced: { kind: 'fixed', quantity: 1, unitAmount: amount } }],
          prices: { ...settings, taxRateBasisPoints: null },
          userId,
        });
        await mailInvoice(tx, deps, issued.id);
        return issued;
      });
      return one(restorationId, row.id);
    },

    /** The final invoice as it would be issued now, for the technician to read before issuing. */
    async preview(restorationId: number): Promise<InvoicePreview> {
      const settings = await readWorkshopSettings(db);
      return previewOf(await finalLines(db, restorationId, settings), settings);
    },

    /** The final invoice: billable labour at the workshop rate, fitted parts at cost plus markup, less deposits paid. */
    async final(restorationId: number, userId: number) {
      const row = await unitOfWork(db, async (tx) => {
        await lockRestoration(tx, restorationId);
        const existing = await invoicesRepo(tx).liveFinal(restorationId);
        if (existing)
          throw new ConflictError(
            `Invoice ${referenceOf(existing)} is already issued for this set: void it before issuing another.`,
          );
        const settings = await readWorkshopSettings(tx);
        const { lines, deducted } = await finalLines(tx, restorationId, settings);
        if (!lines.length)
          throw new ConflictError('Nothing to invoice yet: log billable time or mark parts fitted with their cost.');
        const issued = await issueInvoice(tx, {
          restorationId,
          kind: 'final',
          lines,
          prices: settings,
          deducted,
          userId,
        });
        await mailInvoice(tx, deps, issued.id);
        return issued;
      });
      return one(restorationId, row.id);
    },

    /** Voids an issued invoice or deposit request: it stays as issued, marked void, and a credit note reverses it. */
    async void(invoiceId: number, reason: string, userId: number) {
      const { restorationId, creditId } = await unitOfWork(db, async (tx) => {
        const rows = invoicesRepo(tx);
        const i = await rows.lockVoidable(invoiceId);
        if (!i) throw new NotFoundError();
        if (i.voidedAt) throw new ConflictError(`Invoice ${referenceOf(i)} is already void.`);
        if (i.paid > 0)
          throw new ConflictError(`Invoice ${referenceOf(i)} has payments: refund them before voiding it.`);
        const lines = await rows.linesOf([i.id]);
        await rows.markVoid(i.id, reason);
        await recordEvent(tx, {
          restorationId: i.restorationId,
          kind: 'invoice-voided',
          actorId: userId,
          data: { invoiceId: i.id, number: i.number, reference: referenceOf(i) },
        });
        const credit = await issueInvoice(tx, {
          restorationId: i.restorationId,
          kind: 'credit-note',
          creditsInvoiceId: i.id,
          userId,
          deducted: -i.deducted,
          lines: lines.map((l) => ({
            description: `Reverses: ${l.description}`,
            priced: { kind: 'fixed', quantity: -1, unitAmount: l.net },
          })),
          prices: {
            currency: i.currency,
            taxName: i.taxName,
            taxRateBasisPoints: i.taxRateBasisPoints,
            taxRounding: i.taxRounding,
          },
        });
        await mailInvoice(tx, deps, credit.id);
        return { restorationId: i.restorationId, creditId: credit.id };
      });
      return one(restorationId, creditId);
    },
  };
}
