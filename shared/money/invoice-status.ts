/** Where an issued document stands, for every screen, PDF and route: derived here and nowhere else. */
export const invoiceStatuses = ['open', 'paid', 'refunded', 'void', 'credit'] as const;
export type InvoiceStatus = (typeof invoiceStatuses)[number];

/** The stored figures the status is derived from, in minor units of the invoice's currency. */
export interface InvoiceFigures {
  kind: 'deposit' | 'final' | 'credit-note';
  voided: boolean;
  due: number;
  /** Received less refunded. */
  paid: number;
  /** Given back (succeeded refunds). */
  refunded: number;
}

/**
 * What is still to pay. A refund gives money back and never asks for it again: what was received counts against
 * the amount due whether or not it was refunded later. Nothing is left on a void document or a credit note.
 */
export function amountLeft(i: InvoiceFigures): number {
  if (i.voided || i.kind === 'credit-note') return 0;
  return Math.max(0, i.due - (i.paid + i.refunded));
}

/**
 * Void and credit notes first; then open while anything is left to pay; then refunded when everything received
 * went back, otherwise paid (a partial refund of a settled invoice leaves it paid).
 */
export function invoiceStatus(i: InvoiceFigures): InvoiceStatus {
  if (i.voided) return 'void';
  if (i.kind === 'credit-note') return 'credit';
  if (amountLeft(i) > 0) return 'open';
  return i.paid <= 0 && i.refunded > 0 ? 'refunded' : 'paid';
}

/**
 * Of a card payment of `amount` arriving on an invoice with `left` still to pay (0 when void), what was not due
 * and so is to be given back.
 */
export const notDue = (amount: number, left: number) => Math.max(0, amount - Math.max(0, left));
