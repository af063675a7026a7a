import { z } from 'zod';
import { moneySchema } from './estimates';
import { idSchema } from './ids';
import { invoiceKinds } from './invoices';

export const paymentMethods = ['card', 'transfer', 'cash'] as const;
export type PaymentMethod = (typeof paymentMethods)[number];
/** A checkout that has not been settled yet is `pending`; only the payment service's verified events move it on. */
export const paymentStatuses = ['pending', 'succeeded', 'failed'] as const;
export const paymentKinds = ['payment', 'refund'] as const;

export const paymentMethodLabels: Record<PaymentMethod, string> = {
  card: 'Card',
  transfer: 'Bank transfer',
  cash: 'Cash',
};

const positiveMoney = z.object({
  amount: z
    .number()
    .int('must be whole minor units (pence, cents)')
    .min(1, 'must be more than nothing')
    .max(100_000_000),
  currency: z.string().trim().toUpperCase().length(3, 'must be an ISO 4217 code such as GBP'),
});

export const paymentParamsSchema = z.object({ paymentId: idSchema });

/** Body of POST /api/invoices/:invoiceId/payments: a transfer or cash received, recorded by a technician. */
export const manualPaymentInputSchema = z.object({
  amount: positiveMoney,
  method: z.enum(['transfer', 'cash']),
  receivedOn: z.iso.date('must be a date such as 2026-12-02'),
});
export type ManualPaymentInput = z.infer<typeof manualPaymentInputSchema>;

/** Body of POST /api/payments/:paymentId/refund: the whole payment when no amount is given. */
export const refundInputSchema = z.object({ amount: positiveMoney.optional() });
export type RefundInput = z.infer<typeof refundInputSchema>;

/** Answer of POST /api/invoices/:invoiceId/checkout: the payment service's hosted checkout page. */
export const checkoutSchema = z.object({ url: z.url() });

/** A payment or a refund line on an invoice, amounts in minor units with their currency. */
export const paymentSchema = z.object({
  id: z.number(),
  invoiceId: z.number(),
  invoiceNumber: z.number(),
  invoiceKind: z.enum(invoiceKinds),
  kind: z.enum(paymentKinds),
  method: z.enum(paymentMethods),
  status: z.enum(paymentStatuses),
  amount: moneySchema,
  /** Card payments: what has been refunded of it so far (succeeded refunds). */
  refunded: moneySchema,
  /** A card payment that arrived when it was not due (its invoice void, or already paid): what is still to give back. */
  refundDue: moneySchema,
  /** The payment a refund returns. */
  refundOfId: z.number().nullable(),
  /** The checkout session a card payment came from (the way back from the checkout page names it). */
  checkoutSessionId: z.string().nullable(),
  receivedOn: z.string().nullable(),
  createdAt: z.string(),
});
export type Payment = z.infer<typeof paymentSchema>;

/**
 * Answer of POST /api/payments/:paymentId/refund: a transfer or cash refund is recorded at once (201, the refund line);
 * a card refund is asked of the payment service and shows once its event arrives (202, pending).
 */
export const refundAnswerSchema = z.union([
  paymentSchema,
  z.object({ refundId: z.string(), amount: moneySchema, status: z.literal('pending') }),
]);
export type RefundAnswer = z.infer<typeof refundAnswerSchema>;
