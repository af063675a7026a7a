// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Invoice, InvoicePreview } from '../../../../shared/schemas/invoices';
import { apiError, fakeApi, ok } from '../../../testing/fake-api';
import { renderWithQueries } from '../../../testing/render';
import { InvoicePanel } from './invoice-panel';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const gbp = (amount: number) => ({ amount, currency: 'GBP' });
const vat = { name: 'VAT', rateBasisPoints: 2000 };
const deposit: Invoice = {
  id: 11,
  number: 41,
  reference: 'CL-41',
  kind: 'deposit',
  issuedAt: '2026-11-20T10:00:00.000Z',
  tax: null,
  net: gbp(3600),
  taxAmount: gbp(0),
  gross: gbp(3600),
  deducted: gbp(0),
  due: gbp(3600),
  paid: gbp(3600),
  refunded: gbp(0),
  left: gbp(0),
  status: 'paid',
  creditsInvoiceId: null,
  voidReason: null,
  lines: [{ description: 'Deposit', net: gbp(3600), tax: gbp(0) }],
};
// Worked by hand: £100.00 labour + £2.49 part = £102.49; VAT 20% rounded down £20.49; £122.98; less £36.00 deposit: £86.98.
const preview: InvoicePreview = {
  tax: vat,
  lines: [
    { description: 'Labour, 2.5 h', net: gbp(10000), tax: gbp(0) },
    { description: 'C27 22nF 630V', net: gbp(249), tax: gbp(0) },
  ],
  net: gbp(10249),
  taxAmount: gbp(2049),
  gross: gbp(12298),
  deducted: gbp(3600),
  due: gbp(8698),
};
const final: Invoice = {
  ...deposit,
  ...preview,
  id: 12,
  number: 42,
  reference: 'CL-42',
  kind: 'final',
  paid: gbp(0),
  left: preview.due,
  status: 'open',
  issuedAt: '2026-12-01T10:00:00.000Z',
};

const renderPanel = (canEdit: boolean) =>
  renderWithQueries(<InvoicePanel restorationId={7} canEdit={canEdit} currency="GBP" />, { router: false });

describe('InvoicePanel', () => {
  it('when the technician builds the final invoice, then it shows the lines, VAT and the deposit deducted, and issues after confirming', async () => {
    let issued = false;
    const api = fakeApi((c) =>
      c.path.endsWith('/preview')
        ? ok(preview)
        : c.method === 'GET'
          ? ok(issued ? [final, deposit] : [deposit])
          : ((issued = true), { status: 201, body: final }),
    );
    renderPanel(true);
    await userEvent.click(await screen.findByRole('button', { name: 'Build the final invoice' }));
    const draft = await screen.findByRole('region', { name: 'Final invoice, not yet issued' });
    expect(within(draft).getByRole('row', { name: /Less deposits paid/ })).toHaveTextContent('-£36.00');
    expect(within(draft).getByRole('row', { name: /VAT at 20%/ })).toHaveTextContent('£20.49');
    expect(within(draft).getByRole('row', { name: /Amount due/ })).toHaveTextContent('£86.98');
    await userEvent.click(within(draft).getByRole('button', { name: 'Issue the final invoice' }));
    await userEvent.click(await screen.findByRole('button', { name: 'Issue and e-mail it' }));
    expect(await screen.findByRole('heading', { name: 'Invoice CL-42' })).toBeInTheDocument();
    expect(api.calls.filter((c) => c.method === 'POST')).toEqual([
      { method: 'POST', path: '/restorations/7/invoices', body: undefined },
    ]);
  });

  it('when the technician asks for 30% of the estimate, then the request carries basis points; a refusal is shown', async () => {
    const api = fakeApi((c) =>
      c.method === 'GET'
        ? ok([])
        : apiError(409, 'No approved estimate to take a share of: ask for a fixed amount, or send an estimate first.'),
    );
    renderPanel(true);
    expect(await screen.findByText('No invoices yet')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Request a deposit' }));
    await userEvent.type(screen.getByLabelText('Per cent of the high figure'), '30');
    await userEvent.click(screen.getByRole('button', { name: 'Issue the deposit request' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('No approved estimate');
    expect(api.calls.find((c) => c.method === 'POST')).toEqual({
      method: 'POST',
      path: '/restorations/7/deposits',
      body: { shareBasisPoints: 3000 },
    });
  });

  it('when the owner reads their invoices, then they see amounts, PDF and receipt links, and no way to issue or void', async () => {
    fakeApi(() => ok([final, deposit]));
    renderPanel(false);
    expect(await screen.findByRole('heading', { name: 'Invoice CL-42' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'PDF of CL-42' })).toHaveAttribute(
      'href',
      expect.stringMatching(/^\/api\/invoices\/12\/invoice\.pdf/),
    );
    expect(screen.getByRole('link', { name: 'Receipt for CL-41' })).toHaveAttribute(
      'href',
      expect.stringMatching(/^\/api\/invoices\/11\/receipt\.pdf/),
    );
    expect(screen.queryByRole('link', { name: 'Receipt for CL-42' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Void|Build|Request/ })).not.toBeInTheDocument();
  });

  it('when the technician voids an invoice, then a reason is required and sent', async () => {
    const api = fakeApi((c) =>
      c.method === 'GET'
        ? ok([final])
        : ok({
            ...final,
            id: 13,
            number: 43,
            reference: 'CL-43',
            kind: 'credit-note',
            status: 'credit',
            creditsInvoiceId: 12,
          }),
    );
    renderPanel(true);
    await userEvent.click(await screen.findByRole('button', { name: 'Void CL-42…' }));
    const submit = screen.getByRole('button', { name: 'Void and issue a credit note' });
    expect(submit).toBeDisabled();
    await userEvent.type(screen.getByLabelText('Why is it void?'), 'Wrong labour rate');
    await userEvent.click(submit);
    await waitFor(() => expect(api.calls.some((c) => c.method === 'POST')).toBe(true));
    expect(api.calls.find((c) => c.method === 'POST')).toEqual({
      method: 'POST',
      path: '/invoices/12/void',
      body: { reason: 'Wrong labour rate' },
    });
  });

  it('when a deposit was refunded in full, then its card says refunded and what went back, and offers a receipt', async () => {
    fakeApi(() => ok([{ ...deposit, paid: gbp(0), refunded: gbp(3600), status: 'refunded' }]));
    renderPanel(true);
    const card = await screen.findByRole('region', { name: 'Deposit request CL-41' });
    expect(within(card).getByText('Refunded', { selector: 'p' })).toBeInTheDocument();
    expect(card).toHaveTextContent('Refunded: £36.00 — everything received went back; nothing is left to pay.');
    expect(within(card).getByRole('link', { name: 'Receipt for CL-41' })).toBeInTheDocument();
  });
});
