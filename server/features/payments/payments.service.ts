import { and, eq, inArray } from 'drizzle-orm';
import Stripe from 'stripe';
import type { Role } from '../../../shared/permissions';
import { invoiceKindLabels } from '../../../shared/schemas/invoices';
import type { ManualPaymentInput, RefundAnswer, RefundInput } from '../../../shared/schemas/payments';
import type { AppDeps } from '../../app-deps';
import type { Executor } from '../../db/client';
import { invoices, payments } from '../../db/schema';
import { BadRequestError, ConflictError, HttpError, NotFoundError } from '../../http/errors';
import { listPayments, lockInvoice, outstanding, recordPaymentEvent, settleInvoice } from './payments.repo';

type Deps = Pick<AppDeps, 'db' | 'payments' | 'config'>;

/** The service refused or could not be reached: nothing was charged or refunded. */
function serviceError(err: unknown): never {
  if (err instanceof Stripe.errors.StripeInvalidRequestError)
    throw new ConflictError(`The payment service refused: ${err.message}`);
  throw new HttpError(
    502,
    'internal',
    'The payment service did not answer, so nothing was charged or refunded. Try again in a minute.',
  );
}

const sameCurrency = (given: string, invoiceCurrency: string) => {
  if (given !== invoiceCurrency)
    throw new BadRequestError(`The amount must be in ${invoiceCurrency}, the invoice's currency.`);
};

/** Card checkouts, transfers and cash recorded by hand, and refunds. Card state itself changes only from webhooks. */
export function paymentsService({ db, payments: service, config }: Deps) {
  return {
    list: (restorationId: number, role: Role) => listPayments(db, restorationId, role),

    async restorationOfInvoice(invoiceId: number) {
      const [row] = await db
        .select({ restorationId: invoices.restorationId })
        .from(invoices)
        .where(eq(invoices.id, invoiceId));
      return row?.restorationId;
    },
    async restorationOfPayment(paymentId: number) {
      const [row] = await db
        .select({ restorationId: payments.restorationId })
        .from(payments)
        .where(eq(payments.id, paymentId));
      return row?.restorationId;
    },

    /**
     * A hosted checkout for what is still due. Nothing is written: the payment exists once the service's event
     * says so. The way back lands on the set's page, which shows "processing" until that event arrives.
     */
    async checkout(invoiceId: number, role: Role): Promise<{ url: string }> {
      const [invoice] = await db.select().from(invoices).where(eq(invoices.id, invoiceId));
      if (!invoice) throw new NotFoundError();
      const amount = outstanding(invoice);
      if (amount <= 0)
        throw new ConflictError(
          invoice.voidedAt
            ? `Invoice ${invoice.number} is void.`
            : `${invoiceKindLabels[invoice.kind]} ${invoice.number} has nothing left to pay.`,
        );
      // The owner comes back to their set's page; a technician taking the payment, to the Money tab.
      const page =
        role === 'owner' ? `/home?set=${invoice.restorationId}&` : `/restorations/${invoice.restorationId}/money?`;
      // The service puts the session's id in place of {CHECKOUT_SESSION_ID} on the way back from a completed checkout.
      const back = (outcome: string) => `${config.publicOrigin}${page}payment=${outcome}&invoice=${invoice.id}`;
      const session = await service.sdk.checkout.sessions
        .create({
          mode: 'payment',
          line_items: [
            {
              quantity: 1,
              price_data: {
                currency: invoice.currency.toLowerCase(),
                unit_amount: amount,
                product_data: { name: `Gridleak ${invoiceKindLabels[invoice.kind].toLowerCase()} ${invoice.number}` },
              },
            },
          ],
          client_reference_id: String(invoice.id),
          metadata: { invoiceId: String(invoice.id), restorationId: String(invoice.restorationId) },
          success_url: `${back('processing')}&session={CHECKOUT_SESSION_ID}`,
          cancel_url: back('cancelled'),
        })
        .catch(serviceError);
      if (!session.url) throw new HttpError(502, 'internal', 'The payment service gave no checkout page.');
      return { url: session.url };
    },

    /** A transfer or cash, recorded by a technician: paid at once, with its history line, in one transaction. */
    async record(invoiceId: number, input: ManualPaymentInput, userId: number, role: Role) {
      const id = await db.transaction(async (tx) => {
        const invoice = await lockInvoice(tx, invoiceId);
        sameCurrency(input.amount.currency, invoice.currency);
        const left = outstanding(invoice);
        if (input.amount.amount > left)
          throw new ConflictError(
            left
              ? `Only ${left} (minor units) is left to pay on ${invoiceKindLabels[invoice.kind].toLowerCase()} ${invoice.number}.`
              : `Nothing is left to pay on ${invoiceKindLabels[invoice.kind].toLowerCase()} ${invoice.number}.`,
          );
        const [row] = await tx
          .insert(payments)
          .values({
            invoiceId,
            restorationId: invoice.restorationId,
            kind: 'payment',
            method: input.method,
            status: 'succeeded',
            amount: input.amount.amount,
            currency: invoice.currency,
            receivedOn: input.receivedOn,
            recordedById: userId,
            settledAt: new Date(),
          })
          .returning();
        await settleInvoice(tx, invoiceId);
        await recordPaymentEvent(tx, invoice, row!, userId);
        return { restorationId: invoice.restorationId, id: row!.id };
      });
      return (await listPayments(db, id.restorationId, role, id.id))[0]!;
    },

    /**
     * A refund of all or part of a payment. A card refund is asked of the service and appears when its event
     * arrives (202); a transfer or cash refund is recorded at once (201).
     */
    async refund(
      paymentId: number,
      input: RefundInput,
      userId: number,
      role: Role,
    ): Promise<{ status: 201 | 202; body: RefundAnswer }> {
      const [p] = await db
        .select()
        .from(payments)
        .where(and(eq(payments.id, paymentId), eq(payments.kind, 'payment')));
      if (!p) throw new NotFoundError();
      if (p.status !== 'succeeded') throw new ConflictError('Only a payment that went through can be refunded.');
      if (input.amount) sameCurrency(input.amount.currency, p.currency);
      // Refunds asked for and not yet failed count against what is left; checked again under the lock for a manual one.
      const refundable = async (ex: Executor) => {
        const earlier = await ex
          .select({ amount: payments.amount })
          .from(payments)
          .where(and(eq(payments.refundOfId, p.id), inArray(payments.status, ['pending', 'succeeded'])));
        const left = p.amount - earlier.reduce((a, r) => a + r.amount, 0);
        const amount = input.amount?.amount ?? left;
        if (amount <= 0 || amount > left)
          throw new ConflictError(
            left
              ? `At most ${left} (minor units) of this payment can be refunded.`
              : 'This payment is already refunded in full.',
          );
        return amount;
      };
      const amount = await refundable(db);
      if (p.method === 'card') {
        const refund = await service.sdk.refunds
          .create({
            payment_intent: p.paymentIntentId!,
            amount,
            metadata: { paymentId: String(p.id), recordedById: String(userId) },
          })
          .catch(serviceError);
        return {
          status: 202,
          body: { refundId: refund.id, amount: { amount, currency: p.currency }, status: 'pending' },
        };
      }
      const id = await db.transaction(async (tx) => {
        const invoice = await lockInvoice(tx, p.invoiceId);
        const [row] = await tx
          .insert(payments)
          .values({
            invoiceId: p.invoiceId,
            restorationId: p.restorationId,
            kind: 'refund',
            method: p.method,
            status: 'succeeded',
            amount: await refundable(tx),
            currency: p.currency,
            refundOfId: p.id,
            recordedById: userId,
            receivedOn: new Date().toISOString().slice(0, 10),
            settledAt: new Date(),
          })
          .returning();
        await settleInvoice(tx, p.invoiceId);
        await recordPaymentEvent(tx, invoice, row!, userId);
        return row!.id;
      });
      return { status: 201, body: (await listPayments(db, p.restorationId, role, id))[0]! };
    },
  };
}
