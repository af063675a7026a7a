import { and, asc, eq, sql } from 'drizzle-orm';
import { amountLeft } from '../../../shared/money/invoice-status';
import { formatMoney } from '../../../shared/money/currency';
import { mayView, type Role } from '../../../shared/permissions';
import { invoiceKindLabels } from '../../../shared/schemas/invoices';
import { paymentMethodLabels, type Payment } from '../../../shared/schemas/payments';
import type { Executor, Tx } from '../../db/client';
import { events, invoices, payments } from '../../db/schema';
import { NotFoundError } from '../../http/errors';
import { notificationsRepo } from '../notifications/notifications.repo';
import { visibleSql } from '../visibility/visibility-sql';

type Row = typeof payments.$inferSelect;
export type InvoiceRow = typeof invoices.$inferSelect;

/** The invoice, locked for the rest of the transaction, so payments on it are settled one after another. */
export async function lockInvoice(tx: Tx, invoiceId: number): Promise<InvoiceRow> {
  const [row] = await tx.select().from(invoices).where(eq(invoices.id, invoiceId)).for('update');
  if (!row) throw new NotFoundError();
  return row;
}

/** What is still to pay on an invoice (`amountLeft`): nothing on a void one, a credit note, or one settled or refunded. */
export const outstanding = (i: InvoiceRow) =>
  amountLeft({ kind: i.kind, voided: i.voidedAt !== null, due: i.due, paid: i.paid, refunded: i.refunded });

/**
 * Recomputes the invoice's `paid` (succeeded payments less succeeded refunds) and `refunded`, so settling twice
 * gives the same answer. The caller holds the invoice lock.
 */
export async function settleInvoice(tx: Tx, invoiceId: number) {
  const [{ received, refunded } = { received: 0, refunded: 0 }] = await tx
    .select({
      received: sql<number>`coalesce(sum(${payments.amount}) filter (where ${payments.kind} = 'payment'), 0)::int`,
      refunded: sql<number>`coalesce(sum(${payments.amount}) filter (where ${payments.kind} = 'refund'), 0)::int`,
    })
    .from(payments)
    .where(and(eq(payments.invoiceId, invoiceId), eq(payments.status, 'succeeded')));
  await tx
    .update(invoices)
    .set({ paid: received - refunded, refunded })
    .where(eq(invoices.id, invoiceId));
}

/**
 * The history line and the notifications (technicians and the owner, never mentors; not the person who recorded it)
 * for money that arrived or went back, in the same transaction as the change.
 */
export async function recordPaymentEvent(tx: Tx, invoice: InvoiceRow, p: Row, actorId: number | null) {
  await tx.insert(events).values({
    restorationId: invoice.restorationId,
    kind: p.kind === 'refund' ? 'payment-refunded' : 'payment-received',
    actorId,
    data: { invoiceId: invoice.id, number: invoice.number, kind: invoice.kind, method: p.method, paymentId: p.id },
  });
  const what = `${invoiceKindLabels[invoice.kind].toLowerCase()} no. ${invoice.number}`;
  const amount = formatMoney({ amount: p.amount, currency: p.currency }, 'en-GB');
  const summary =
    p.kind === 'refund'
      ? `Refund of ${amount} on ${what} (${paymentMethodLabels[p.method].toLowerCase()})`
      : `Payment of ${amount} received for ${what} (${paymentMethodLabels[p.method].toLowerCase()})${
          p.refundDue
            ? `; ${formatMoney({ amount: p.refundDue, currency: p.currency }, 'en-GB')} of it was not due (${invoice.voidedAt ? 'the invoice is void' : 'already paid'}) and is to be refunded`
            : ''
        }`;
  const people = await notificationsRepo(tx).membersWithRole(invoice.restorationId, ['technician', 'owner']);
  await notificationsRepo(tx).insert(
    people
      .filter((m) => m.userId !== actorId && mayView(m.role, 'payment', {}))
      .map((m) => ({ userId: m.userId, restorationId: invoice.restorationId, kind: 'payment' as const, summary })),
  );
}

function present(p: Row, invoice: { number: number; kind: InvoiceRow['kind'] }, all: Row[]): Payment {
  const refunded =
    p.kind === 'payment'
      ? all.filter((r) => r.refundOfId === p.id && r.status === 'succeeded').reduce((a, r) => a + r.amount, 0)
      : 0;
  return {
    id: p.id,
    invoiceId: p.invoiceId,
    invoiceNumber: invoice.number,
    invoiceKind: invoice.kind,
    kind: p.kind,
    method: p.method,
    status: p.status,
    amount: { amount: p.amount, currency: p.currency },
    refunded: { amount: refunded, currency: p.currency },
    refundDue: { amount: Math.max(0, p.refundDue - refunded), currency: p.currency },
    refundOfId: p.refundOfId,
    checkoutSessionId: p.checkoutSessionId,
    receivedOn: p.receivedOn,
    createdAt: p.createdAt.toISOString(),
  };
}

/** A restoration's payments and refunds, oldest first, as far as the role may see them (mentors: none). */
export async function listPayments(db: Executor, restorationId: number, role: Role, only?: number): Promise<Payment[]> {
  const rows = await db
    .select({ p: payments, number: invoices.number, kind: invoices.kind })
    .from(payments)
    .innerJoin(invoices, eq(invoices.id, payments.invoiceId))
    .where(and(eq(payments.restorationId, restorationId), visibleSql(role, 'payment', {})))
    .orderBy(asc(payments.createdAt), asc(payments.id));
  const all = rows.map((r) => r.p);
  return rows.filter((r) => only === undefined || r.p.id === only).map((r) => present(r.p, r, all));
}
