import { and, eq } from 'drizzle-orm';
import type Stripe from 'stripe';
import type { Database, Tx } from '../../db/client';
import { paymentEvents, payments } from '../../db/schema';
import { ConflictError } from '../../http/errors';
import { notDue } from '../../../shared/money/invoice-status';
import { lockInvoice, outstanding, recordPaymentEvent, settleInvoice } from './payments.repo';

type Status = (typeof payments.$inferSelect)['status'];

/** What a checkout session event says about its payment; null when it says nothing (an expired session never paid). */
function sessionOutcome(type: string, s: Stripe.Checkout.Session): Status | null {
  if (type === 'checkout.session.completed')
    return s.payment_status === 'paid' ? 'succeeded' : s.payment_status === 'unpaid' ? 'pending' : null;
  if (type === 'checkout.session.async_payment_succeeded') return 'succeeded';
  if (type === 'checkout.session.async_payment_failed' || type === 'checkout.session.expired') return 'failed';
  return null;
}

const refundOutcome = (r: Stripe.Refund): Status =>
  r.status === 'succeeded' ? 'succeeded' : r.status === 'failed' || r.status === 'canceled' ? 'failed' : 'pending';
const idOf = (v: string | { id: string } | null | undefined) => (typeof v === 'string' ? v : (v?.id ?? null));

/**
 * Moves a row from pending to what the event says. Succeeded and failed are final, so an event delivered again,
 * or late (a "completed, unpaid" after "payment succeeded"), changes nothing. Returns whether it just succeeded.
 */
async function advance(tx: Tx, row: typeof payments.$inferSelect, status: Status, at: Date): Promise<boolean> {
  if (row.status !== 'pending' || status === 'pending') return false;
  await tx.update(payments).set({ status, settledAt: at }).where(eq(payments.id, row.id));
  return status === 'succeeded';
}

async function fromSession(tx: Tx, type: string, s: Stripe.Checkout.Session, at: Date): Promise<number | null> {
  const status = sessionOutcome(type, s);
  const invoiceId = Number(s.metadata?.invoiceId);
  if (!status || !Number.isInteger(invoiceId) || !s.amount_total || !s.currency) return null;
  const invoice = await lockInvoice(tx, invoiceId).catch(() => null);
  if (!invoice) return null;
  if (s.currency.toUpperCase() !== invoice.currency)
    throw new ConflictError(`Checkout ${s.id} is in ${s.currency}, the invoice in ${invoice.currency}.`);
  const [existing] = await tx.select().from(payments).where(eq(payments.checkoutSessionId, s.id));
  // An expiry or failure of a checkout never recorded is nothing to show: only a completed checkout becomes a line.
  if (!existing && type === 'checkout.session.expired') return null;
  const row =
    existing ??
    (
      await tx
        .insert(payments)
        .values({
          invoiceId,
          restorationId: invoice.restorationId,
          kind: 'payment',
          method: 'card',
          status: 'pending',
          amount: s.amount_total,
          currency: invoice.currency,
          checkoutSessionId: s.id,
          paymentIntentId: idOf(s.payment_intent),
        })
        .returning()
    )[0]!;
  if (!row.paymentIntentId && s.payment_intent)
    await tx
      .update(payments)
      .set({ paymentIntentId: idOf(s.payment_intent) })
      .where(eq(payments.id, row.id));
  if (await advance(tx, row, status, at)) {
    // Money taken for an invoice voided (or paid another way) meanwhile is kept on record, never dropped, and
    // flagged with what was not due, for a technician to refund: the webhook itself never moves money.
    const refundDue = notDue(row.amount, outstanding(invoice));
    if (refundDue) await tx.update(payments).set({ refundDue }).where(eq(payments.id, row.id));
    await settleInvoice(tx, invoiceId);
    await recordPaymentEvent(tx, invoice, { ...row, status: 'succeeded', refundDue }, null);
  }
  return row.id;
}

async function fromRefund(tx: Tx, r: Stripe.Refund, at: Date): Promise<number | null> {
  const intent = idOf(r.payment_intent);
  if (!intent) return null;
  const [paid] = await tx
    .select()
    .from(payments)
    .where(and(eq(payments.paymentIntentId, intent), eq(payments.kind, 'payment')));
  // Not known yet (its checkout event is still on its way): answer an error, so the service sends this one again later.
  if (!paid) throw new ConflictError(`No payment recorded yet for ${intent}; send the refund again later.`);
  const invoice = await lockInvoice(tx, paid.invoiceId);
  await tx
    .insert(payments)
    .values({
      invoiceId: paid.invoiceId,
      restorationId: paid.restorationId,
      kind: 'refund',
      method: 'card',
      status: 'pending',
      amount: r.amount,
      currency: paid.currency,
      paymentIntentId: intent,
      refundId: r.id,
      refundOfId: paid.id,
      recordedById: Number(r.metadata?.recordedById) || null,
    })
    .onConflictDoNothing({ target: payments.refundId });
  const [row] = await tx.select().from(payments).where(eq(payments.refundId, r.id)).for('update');
  if (await advance(tx, row!, refundOutcome(r), at)) {
    await settleInvoice(tx, paid.invoiceId);
    await recordPaymentEvent(tx, invoice, { ...row!, status: 'succeeded' }, row!.recordedById);
  }
  return row!.id;
}

/**
 * Applies one verified event, once: its id is stored in the same transaction as the change it causes, so a
 * replay finds it and changes nothing. Returns false for an event already applied.
 */
export async function applyPaymentEvent(db: Database, event: Stripe.Event): Promise<boolean> {
  return db.transaction(async (tx) => {
    const [fresh] = await tx
      .insert(paymentEvents)
      .values({ id: event.id, type: event.type })
      .onConflictDoNothing()
      .returning();
    if (!fresh) return false;
    const at = new Date(event.created * 1000);
    let paymentId: number | null = null;
    if (event.type.startsWith('checkout.session.'))
      paymentId = await fromSession(tx, event.type, event.data.object as Stripe.Checkout.Session, at);
    else if (event.type === 'refund.created' || event.type === 'refund.updated')
      paymentId = await fromRefund(tx, event.data.object as Stripe.Refund, at);
    else if (event.type === 'charge.refunded')
      for (const r of (event.data.object as Stripe.Charge).refunds?.data ?? []) paymentId = await fromRefund(tx, r, at);
    if (paymentId) await tx.update(paymentEvents).set({ paymentId }).where(eq(paymentEvents.id, event.id));
    return true;
  });
}
