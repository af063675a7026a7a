import { describe, expect, it } from 'vitest';
import { amountLeft, invoiceStatus, notDue, type InvoiceFigures } from './invoice-status';

// Worked examples of the workshop's own rule (common practice, no source): a refund returns money and does not
// reopen what was settled; a void document or a credit note asks for nothing.
const deposit = (over: Partial<InvoiceFigures> = {}): InvoiceFigures => ({
  kind: 'deposit',
  voided: false,
  due: 5000,
  paid: 0,
  refunded: 0,
  ...over,
});

describe('invoiceStatus and amountLeft', () => {
  it('when nothing has been paid, then the whole amount is left and it is open', () => {
    expect(amountLeft(deposit())).toBe(5000);
    expect(invoiceStatus(deposit())).toBe('open');
  });

  it('when part has been paid, then the rest is left', () => {
    expect(amountLeft(deposit({ paid: 2000 }))).toBe(3000);
    expect(invoiceStatus(deposit({ paid: 2000 }))).toBe('open');
  });

  it('when it was paid and then refunded in full, then it is refunded with nothing left to pay', () => {
    const f = deposit({ paid: 0, refunded: 5000 });
    expect(amountLeft(f)).toBe(0);
    expect(invoiceStatus(f)).toBe('refunded');
  });

  it('when a settled invoice was refunded in part, then it stays paid with nothing left', () => {
    const f = deposit({ paid: 3500, refunded: 1500 });
    expect(amountLeft(f)).toBe(0);
    expect(invoiceStatus(f)).toBe('paid');
  });

  it('when a part payment was refunded, then only what was never received is left', () => {
    const f = deposit({ paid: 0, refunded: 2000 });
    expect(amountLeft(f)).toBe(3000);
    expect(invoiceStatus(f)).toBe('open');
  });

  it('when it was paid twice and one payment went back, then it is paid', () => {
    expect(invoiceStatus(deposit({ paid: 5000, refunded: 5000 }))).toBe('paid');
  });

  it('when it is void or a credit note, then nothing is left, whatever was paid', () => {
    expect(amountLeft(deposit({ voided: true }))).toBe(0);
    expect(invoiceStatus(deposit({ voided: true, paid: 5000 }))).toBe('void');
    expect(invoiceStatus(deposit({ kind: 'credit-note', due: -5000 }))).toBe('credit');
    expect(amountLeft(deposit({ kind: 'credit-note', due: -5000 }))).toBe(0);
  });

  it('when a final invoice is covered by its deposit (nothing due), then it is paid', () => {
    expect(invoiceStatus(deposit({ kind: 'final', due: 0 }))).toBe('paid');
  });
});

describe('notDue', () => {
  it('gives back all of a payment on a void invoice, and only the excess of one beyond what was left', () => {
    expect(notDue(5000, 0)).toBe(5000);
    expect(notDue(5000, 2000)).toBe(3000);
    expect(notDue(2000, 5000)).toBe(0);
  });
});
