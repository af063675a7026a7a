import { z } from 'zod';
import { invoiceStatuses } from '../money/invoice-status';
import { isTimeZone, moneySchema } from './estimates';
import { idSchema } from './ids';

export const invoiceKinds = ['deposit', 'final', 'credit-note'] as const;
export const invoiceKindLabels: Record<(typeof invoiceKinds)[number], string> = {
  deposit: 'Deposit request',
  final: 'Invoice',
  'credit-note': 'Credit note',
};

/** Body of POST /api/restorations/:id/deposits: an amount in minor units, or a share (basis points) of the latest approved estimate's high figure. */
export const depositInputSchema = z.union([
  z.object({ amount: z.number().int().min(1).max(100_000_000) }),
  z.object({ shareBasisPoints: z.number().int().min(1).max(10_000) }),
]);
export type DepositInput = z.infer<typeof depositInputSchema>;

/** Body of POST /api/invoices/:invoiceId/void. */
export const voidInputSchema = z.object({ reason: z.string().trim().min(1, 'say why it is voided').max(500) });
export const invoiceParamsSchema = z.object({ invoiceId: idSchema });

/** `?timeZone=Europe/London` on an invoice or receipt PDF: the reader's zone for its dates (the workshop's when left out). */
export const documentQuerySchema = z.object({
  timeZone: z.string().max(64).refine(isTimeZone, 'Not a known time zone').optional(),
});

export const invoiceSchema = z.object({
  id: z.number(),
  number: z.number(),
  /** The number as printed, with the workshop's prefix of the day ("CL-42"). */
  reference: z.string(),
  kind: z.enum(invoiceKinds),
  issuedAt: z.string(),
  tax: z.object({ name: z.string(), rateBasisPoints: z.number() }).nullable(),
  net: moneySchema,
  taxAmount: moneySchema,
  gross: moneySchema,
  deducted: moneySchema,
  due: moneySchema,
  /** Received less refunded. */
  paid: moneySchema,
  /** Given back so far. */
  refunded: moneySchema,
  /** Still to pay (`amountLeft` in shared/money): nothing once void, credited, settled or refunded. */
  left: moneySchema,
  /** From `invoiceStatus` in shared/money, the one place it is derived. */
  status: z.enum(invoiceStatuses),
  creditsInvoiceId: z.number().nullable(),
  voidReason: z.string().nullable(),
  lines: z.array(z.object({ description: z.string(), net: moneySchema, tax: moneySchema })),
});
export type Invoice = z.infer<typeof invoiceSchema>;

/** `GET /api/restorations/:id/invoices/preview`: the final invoice as it would be issued now (not numbered, nothing stored). */
export const invoicePreviewSchema = z.object({
  tax: z.object({ name: z.string(), rateBasisPoints: z.number() }).nullable(),
  lines: z.array(z.object({ description: z.string(), net: moneySchema, tax: moneySchema })),
  net: moneySchema,
  taxAmount: moneySchema,
  gross: moneySchema,
  deducted: moneySchema,
  due: moneySchema,
});
export type InvoicePreview = z.infer<typeof invoicePreviewSchema>;
