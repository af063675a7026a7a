// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Role } from '../../../../shared/permissions';
import type { Invoice } from '../../../../shared/schemas/invoices';
import type { Payment } from '../../../../shared/schemas/payments';
import { apiError, fakeApi, ok } from '../../../testing/fake-api';
import { renderWithQueries } from '../../../testing/render';
import { PaymentsPanel } from './payments-panel';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const gbp = (amount: number) => ({ amount, currency: 'GBP' });
const deposit = (over: Partial<Invoice> = {}): Invoice => ({
  id: 4,
  number: 12,
  reference: '12',
  kind: 'deposit',
  issuedAt: '2026-12-01T09:00:00.000Z',
  tax: null,
  net: gbp(5000),
  taxAmount: gbp(0),
  gross: gbp(5000),
  deducted: gbp(0),
  due: gbp(5000),
  paid: gbp(0),
  refunded: gbp(0),
  left: gbp(5000),
  status: 'open',
  creditsInvoiceId: null,
  voidReason: null,
  lines: [{ description: 'Deposit', net: gbp(5000), tax: gbp(0) }],
  ...over,
});
const cardPayment: Payment = {
  id: 9,
  invoiceId: 4,
  invoiceNumber: 12,
  invoiceKind: 'deposit',
  kind: 'payment',
  method: 'card',
  status: 'succeeded',
  amount: gbp(5000),
  refunded: gbp(0),
  refundDue: gbp(0),
  refundOfId: null,
  checkoutSessionId: 'cs_test_a',
  receivedOn: null,
  createdAt: '2026-12-02T09:00:00.000Z',
};

const renderPanel = (role: Role, url = '/home?set=7') =>
  renderWithQueries(<PaymentsPanel restorationId={7} role={role} />, { path: url });

describe('PaymentsPanel', () => {
  it('when the owner has an open deposit, then Pay asks for a checkout and goes to the page it names', async () => {
    const assign = vi.fn();
    vi.stubGlobal('location', { ...window.location, assign });
    const api = fakeApi((c) =>
      c.path.endsWith('/invoices')
        ? ok([deposit()])
        : c.path.endsWith('/payments')
          ? ok([])
          : ok({ url: 'http://127.0.0.1:9/checkout/cs_test_a' }),
    );
    renderPanel('owner');
    expect(await screen.findByText('Deposit request no. 12')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Pay £50.00 by card' }));
    await waitFor(() => expect(assign).toHaveBeenCalledWith('http://127.0.0.1:9/checkout/cs_test_a'));
    expect(api.calls.find((c) => c.method === 'POST')).toMatchObject({ method: 'POST', path: '/invoices/4/checkout' });
  });

  it('when the owner comes back before the payment is confirmed, then it says processing and offers no second Pay for that deposit', async () => {
    fakeApi((c) => (c.path.endsWith('/invoices') ? ok([deposit()]) : ok([])));
    renderPanel('owner', '/home?set=7&payment=processing&invoice=4&session=cs_test_a');
    expect(await screen.findByText(/Payment processing/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Pay/ })).not.toBeInTheDocument();
  });

  it('when the payment is confirmed while the owner waits, then it says received and the lists are not asked again', async () => {
    let confirmed = false;
    const api = fakeApi((c) => {
      if (c.path.endsWith('/invoices'))
        return ok([confirmed ? deposit({ paid: gbp(5000), left: gbp(0), status: 'paid' }) : deposit()]);
      return ok(confirmed ? [cardPayment] : []);
    });
    renderPanel('owner', '/home?set=7&payment=processing&invoice=4&session=cs_test_a');
    expect(await screen.findByText(/Payment processing/)).toBeInTheDocument();
    confirmed = true; // the payment service's event arrives; the next poll (2.5 s) finds it
    expect(await screen.findByText('Payment received. Thank you.', undefined, { timeout: 5_000 })).toBeInTheDocument();
    const asked = api.calls.length;
    await new Promise((r) => setTimeout(r, 3_000)); // longer than a poll's interval
    expect(api.calls.length).toBe(asked);
  }, 15_000);

  it('when a card payment was received, then the technician sees its line with a Refund button and the owner sees it without', async () => {
    fakeApi((c) =>
      c.path.endsWith('/invoices')
        ? ok([deposit({ paid: gbp(5000), left: gbp(0), status: 'paid' })])
        : ok([cardPayment]),
    );
    renderPanel('technician');
    expect(await screen.findByText('Card payment received')).toBeInTheDocument();
    expect(screen.getByText(/for deposit request no\. 12/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Refund the card payment of £50.00' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Pay/ })).not.toBeInTheDocument();
    cleanup();
    renderPanel('owner');
    expect(await screen.findByText('Card payment received')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Refund/ })).not.toBeInTheDocument();
  });

  it('when a technician records a transfer in pounds, then it is sent in pence with the day it arrived', async () => {
    const api = fakeApi((c) =>
      c.path.endsWith('/invoices')
        ? ok([deposit()])
        : c.method === 'GET'
          ? ok([])
          : { status: 201, body: { ...cardPayment, method: 'transfer' } },
    );
    renderPanel('technician');
    await userEvent.type(await screen.findByLabelText('Amount (GBP)'), '20.50');
    const day = screen.getByLabelText('Received on');
    await userEvent.clear(day);
    await userEvent.type(day, '2026-11-30');
    await userEvent.click(screen.getByRole('button', { name: 'Record payment' }));
    await waitFor(() => expect(api.calls.some((c) => c.method === 'POST')).toBe(true));
    expect(api.calls.find((c) => c.method === 'POST')).toEqual({
      method: 'POST',
      path: '/invoices/4/payments',
      body: { amount: { amount: 2050, currency: 'GBP' }, method: 'transfer', receivedOn: '2026-11-30' },
    });
  });

  it('when a technician refunds part of a payment, then the amount defaults to the rest and the part typed is sent in pence', async () => {
    const api = fakeApi((c) =>
      c.path.endsWith('/invoices')
        ? ok([deposit({ paid: gbp(5000), left: gbp(0), status: 'paid' })])
        : c.method === 'GET'
          ? ok([{ ...cardPayment, refunded: gbp(1000) }])
          : { status: 202, body: { refundId: 're_1', amount: gbp(1500), status: 'pending' } },
    );
    renderPanel('technician');
    await userEvent.click(await screen.findByRole('button', { name: 'Refund the card payment of £50.00' }));
    const amount = screen.getByLabelText('Amount to refund (GBP)');
    expect(amount).toHaveValue('40.00'); // £50.00 less the £10.00 already refunded
    await userEvent.clear(amount);
    await userEvent.type(amount, '15');
    await userEvent.click(screen.getByRole('button', { name: 'Refund' }));
    await waitFor(() => expect(api.calls.some((c) => c.method === 'POST')).toBe(true));
    expect(api.calls.find((c) => c.method === 'POST')).toEqual({
      method: 'POST',
      path: '/payments/9/refund',
      body: { amount: { amount: 1500, currency: 'GBP' } },
    });
    expect(await screen.findByText(/Refund asked for/)).toBeInTheDocument();
  });

  it('when the amount to refund is more than is left, not a number, or refused by the server, then it says so clearly', async () => {
    const api = fakeApi((c) =>
      c.path.endsWith('/invoices')
        ? ok([deposit({ paid: gbp(5000), left: gbp(0), status: 'paid' })])
        : c.method === 'GET'
          ? ok([{ ...cardPayment, method: 'cash', checkoutSessionId: null }])
          : apiError(409, 'At most 2000 (minor units) of this payment can be refunded.'),
    );
    renderPanel('technician');
    await userEvent.click(await screen.findByRole('button', { name: 'Refund the cash payment of £50.00' }));
    const amount = screen.getByLabelText('Amount to refund (GBP)');
    await userEvent.clear(amount);
    await userEvent.type(amount, '50.01');
    await userEvent.click(screen.getByRole('button', { name: 'Refund' }));
    expect(await screen.findByText('At most £50.00 of this payment can be refunded.')).toBeInTheDocument();
    expect(amount).toHaveAttribute('aria-invalid', 'true');
    await userEvent.clear(amount);
    await userEvent.type(amount, '12.345');
    await userEvent.click(screen.getByRole('button', { name: 'Refund' }));
    expect(
      await screen.findByText(/Enter an amount in GBP, such as 50.00, with at most 2 decimals/),
    ).toBeInTheDocument();
    expect(api.calls.filter((c) => c.method === 'POST')).toEqual([]);
    await userEvent.clear(amount);
    await userEvent.type(amount, '30');
    await userEvent.click(screen.getByRole('button', { name: 'Refund' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'At most 2000 (minor units) of this payment can be refunded.',
    );
  });

  it('when a deposit was refunded in full, then technician and owner see it as refunded, with no Pay button', async () => {
    const refundedDeposit = deposit({ paid: gbp(0), refunded: gbp(5000), left: gbp(0), status: 'refunded' });
    const lines = [
      { ...cardPayment, refunded: gbp(5000) },
      { ...cardPayment, id: 10, kind: 'refund' as const, refundOfId: 9, checkoutSessionId: null },
    ];
    for (const role of ['owner', 'technician'] as const) {
      fakeApi((c) => (c.path.endsWith('/invoices') ? ok([refundedDeposit]) : ok(lines)));
      renderPanel(role);
      expect(await screen.findByText('Deposit request no. 12: refunded')).toBeInTheDocument();
      expect(screen.getByText('£50.00 went back; nothing is left to pay.')).toBeInTheDocument();
      expect(screen.queryByRole('button', { name: /^Pay/ })).not.toBeInTheDocument();
      expect(screen.queryByRole('form', { name: 'Record a transfer or cash' })).not.toBeInTheDocument();
      cleanup();
    }
  });

  it('when a card payment arrived after its deposit was voided, then the technician is told to refund it and the form offers what was not due', async () => {
    fakeApi((c) =>
      c.path.endsWith('/invoices')
        ? ok([deposit({ status: 'void', left: gbp(0), paid: gbp(5000) })])
        : ok([{ ...cardPayment, refundDue: gbp(5000) }]),
    );
    renderPanel('technician');
    expect(await screen.findByText(/£50.00 of it was not due .*: to be refunded\./)).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Refund the card payment of £50.00' }));
    expect(screen.getByLabelText('Amount to refund (GBP)')).toHaveValue('50.00');
  });
});
