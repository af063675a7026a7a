import { describe, expect, it } from 'vitest';
import type { Invoice } from '../../../../shared/schemas/invoices';
import type { Payment } from '../../../../shared/schemas/payments';
import { POLL_MS, pollingFor, returnState } from './payment-return';

const gbp = (amount: number) => ({ amount, currency: 'GBP' });
const invoice = (status: Invoice['status']) => ({ id: 4, status }) as Invoice;
const card = (status: Payment['status'], checkoutSessionId: string) =>
  ({
    id: 1,
    invoiceId: 4,
    kind: 'payment',
    method: 'card',
    status,
    amount: gbp(5000),
    refunded: gbp(0),
    checkoutSessionId,
  }) as Payment;

describe('the way back from the checkout page', () => {
  it('when the event has not arrived, then it says processing however the redirect looks, and later that it is slow', () => {
    expect(returnState('processing', invoice('open'), [], 'cs_test_a', false)).toBe('processing');
    expect(returnState('processing', invoice('open'), [card('pending', 'cs_test_a')], 'cs_test_a', false)).toBe(
      'processing',
    );
    expect(returnState('processing', invoice('open'), [], 'cs_test_a', true)).toBe('slow');
  });

  it("when this checkout's payment is recorded, then it says received or failed; an earlier failed checkout does not count", () => {
    expect(returnState('processing', invoice('paid'), [card('succeeded', 'cs_test_a')], 'cs_test_a', false)).toBe(
      'received',
    );
    expect(returnState('processing', invoice('open'), [card('failed', 'cs_test_a')], 'cs_test_a', false)).toBe(
      'failed',
    );
    expect(returnState('processing', invoice('open'), [card('failed', 'cs_test_old')], 'cs_test_a', false)).toBe(
      'processing',
    );
  });

  it('when the owner cancelled, or came with no outcome, then it says cancelled, or nothing', () => {
    expect(returnState('cancelled', invoice('open'), [], null, false)).toBe('cancelled');
    expect(returnState(null, invoice('paid'), [], null, false)).toBeNull();
  });
});

describe('asking again while a payment is processed', () => {
  it('when back from the checkout page, then every few seconds, every half minute after the patience runs out, never once settled', () => {
    expect(pollingFor(false, false, false)).toBe(false);
    expect(pollingFor(true, false, false)).toBe(POLL_MS.eager);
    expect(pollingFor(true, false, true)).toBe(POLL_MS.patient);
    expect(pollingFor(true, true, false)).toBe(false);
    expect(pollingFor(true, true, true)).toBe(false);
  });
});
