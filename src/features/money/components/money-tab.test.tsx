// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Role } from '../../../../shared/permissions';
import type { Estimate, WorkshopSettings } from '../../../../shared/schemas/estimates';
import { apiError, fakeApi, ok, type Call, type Reply } from '../../../testing/fake-api';
import { renderWithQueries } from '../../../testing/render';
import { MoneyTab } from './money-tab';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const gbp = (amount: number) => ({ amount, currency: 'GBP' });
const estimate = (over: Partial<Estimate> = {}): Estimate => ({
  id: 5,
  version: 2,
  note: 'After checking the supply.',
  sent: true,
  sentAt: '2026-11-30T09:00:00.000Z',
  createdBy: 'Ada Bench',
  low: gbp(10500),
  high: gbp(18600),
  labourRate: gbp(4000),
  partsMarkupBasisPoints: 2500,
  tax: { name: 'VAT', rateBasisPoints: 2000, rounding: 'invoice-down' },
  decision: null,
  decidedByName: null,
  decidedAt: null,
  lines: [
    {
      id: 1,
      kind: 'labour',
      description: 'Recap and align',
      extra: null,
      minutesLow: 90,
      minutesHigh: 180,
      low: gbp(6000),
      high: gbp(12000),
    },
  ],
  ...over,
});
const settings: WorkshopSettings = {
  currency: 'GBP',
  labourRate: 4000,
  partsMarkupBasisPoints: 2500,
  taxName: 'VAT',
  taxRateBasisPoints: 2000,
  taxRounding: 'invoice-down',
  estimateApprovalRequired: false,
  invoicePrefix: 'CL-',
  timeZone: 'Europe/London',
};

/** The tab's other sections (labour, invoices) answered as empty, so each test speaks only of estimates. */
const withEmptySections =
  (answer: (c: Call) => Reply) =>
  (c: Call): Reply =>
    c.path.endsWith('/invoices') || c.path.endsWith('/findings')
      ? ok([])
      : c.path.endsWith('/labour')
        ? ok({ entries: [], running: null, week: [] })
        : answer(c);

const renderTab = (role: Role) => renderWithQueries(<MoneyTab restorationId={7} role={role} />);

describe('MoneyTab', () => {
  it('when the owner reads the latest estimate, then they approve it with their name and the version they read', async () => {
    const api = fakeApi(
      withEmptySections((c) =>
        c.method === 'GET'
          ? ok([
              estimate(),
              estimate({
                id: 4,
                version: 1,
                decision: 'declined',
                decidedByName: 'Pat Owner',
                decidedAt: '2026-11-29T09:00:00.000Z',
              }),
            ])
          : ok(estimate({ decision: 'approved', decidedByName: 'Pat Owner', decidedAt: '2026-12-01T09:00:00.000Z' })),
      ),
    );
    renderTab('owner');
    expect(await screen.findByRole('heading', { name: 'Estimate, version 1 (earlier)' })).toBeInTheDocument();
    expect(screen.getByText(/Declined by Pat Owner/)).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Approve version 2' }));
    expect(screen.getByText('Type your name to answer.')).toBeInTheDocument();
    await userEvent.type(screen.getByLabelText('Your name'), 'Pat Owner');
    await userEvent.click(screen.getByRole('button', { name: 'Approve version 2' }));
    await waitFor(() => expect(api.calls.some((c) => c.method === 'POST')).toBe(true));
    expect(api.calls.find((c) => c.method === 'POST')).toEqual({
      method: 'POST',
      path: '/estimates/5/decision',
      body: { decision: 'approved', name: 'Pat Owner', version: 2 },
    });
  });

  it('when the technician writes an estimate, then hours become minutes and pounds become pence', async () => {
    const api = fakeApi(
      withEmptySections((c) =>
        c.path.endsWith('/money-settings')
          ? ok(settings)
          : c.method === 'GET'
            ? ok([])
            : { status: 201, body: estimate({ version: 1 }) },
      ),
    );
    renderTab('technician');
    expect(await screen.findByText('No estimate yet')).toBeInTheDocument();
    await userEvent.click(await screen.findByRole('button', { name: 'Write an estimate' }));
    await userEvent.type(screen.getByLabelText('Line 1 description'), 'Recap and align');
    await userEvent.type(screen.getByLabelText('Line 1 low'), '1.5');
    await userEvent.type(screen.getByLabelText('Line 1 high'), '3');
    await userEvent.type(screen.getByLabelText('Line 2 description'), 'Capacitors');
    await userEvent.type(screen.getByLabelText('Line 2 low'), '10');
    await userEvent.type(screen.getByLabelText('Line 2 high'), '16.20');
    await userEvent.click(screen.getByRole('button', { name: 'Send to the owner' }));
    await waitFor(() => expect(api.calls.some((c) => c.method === 'POST')).toBe(true));
    expect(api.calls.find((c) => c.method === 'POST')!.body).toEqual({
      note: '',
      send: true,
      lines: [
        { kind: 'labour', description: 'Recap and align', low: 90, high: 180 },
        { kind: 'part', description: 'Capacitors', low: 1000, high: 1620 },
      ],
    });
  });

  it('when loading fails, then the error shows with a way to try again', async () => {
    fakeApi(() => apiError(500, 'The database is asleep.'));
    renderTab('owner');
    expect(await screen.findByRole('alert')).toHaveTextContent('The database is asleep.');
  });
});
