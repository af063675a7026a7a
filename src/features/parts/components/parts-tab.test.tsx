// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { asOwnerSees, makePart } from '../testing/part-fixtures';
import { fakePartsApi } from '../testing/parts-test-support';
import { renderWithQueries } from '../../../testing/render';
import { PartsTab } from './parts-tab';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const parts = [
  makePart(1, {
    componentRef: 'C15',
    originalRating: '32µF 450V',
    replacementPart: 'Radial',
    replacementRating: '33µF 500V',
    costMinor: 185,
    state: 'planned',
  }),
  makePart(2, {
    componentRef: 'C16',
    originalRating: '32µF 450V',
    replacementPart: 'radial',
    replacementRating: '33 µF 500V',
    quantity: 2,
    state: 'planned',
  }),
  makePart(3, {
    componentRef: 'C4',
    replacementPart: 'Film',
    replacementRating: '0.047µF 630V',
    state: 'ordered',
    source: 'new, supplier',
  }),
  makePart(4, { componentRef: 'C9', replacementPart: 'Film', replacementRating: '0.047µF 630V', state: 'fitted' }),
  makePart(5, { componentRef: 'R12', originalRating: '100k', action: 'kept-original', state: 'planned' }),
];

describe('parts tab', () => {
  it('when an owner opens it, even asking for the shopping list, then they read the ledger: no costs, form, shopping list or CSV export', async () => {
    fakePartsApi(parts.map(asOwnerSees));
    renderWithQueries(
      <PartsTab restorationId={7} role="owner" setName="Ardent 5" view="shopping" onViewChange={() => {}} />,
    );
    await screen.findByRole('row', { name: 'Part C15' });
    expect(screen.queryByRole('columnheader', { name: /Cost/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Record a part' })).not.toBeInTheDocument();
    expect(screen.queryByRole('form')).not.toBeInTheDocument();
    expect(screen.queryByLabelText('Costs in')).not.toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Export CSV' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Shopping list' })).not.toBeInTheDocument();
  });

  it('when a technician opens it, then the shopping list and the CSV export are there', async () => {
    fakePartsApi(parts);
    renderWithQueries(
      <PartsTab restorationId={7} role="technician" setName="Ardent 5" view="ledger" onViewChange={() => {}} />,
    );
    await screen.findByRole('row', { name: 'Part C15' });
    const href = new URL(
      screen.getByRole('link', { name: 'Export CSV' }).getAttribute('href')!,
      'http://gridleak.test',
    );
    expect(href.pathname).toBe('/api/restorations/7/parts.csv');
    // The workshop's currency (GBP until one is chosen) and the reader's time zone go with it.
    expect(href.searchParams.get('currency')).toBe('GBP');
    expect(href.searchParams.get('timeZone')).toBe(Intl.DateTimeFormat().resolvedOptions().timeZone);
    expect(screen.getByRole('button', { name: 'Shopping list' })).toBeInTheDocument();
  });

  it('when a technician asks to record a part or edit one, then the form opens, with that part for an edit', async () => {
    fakePartsApi(parts);
    const user = userEvent.setup();
    renderWithQueries(
      <PartsTab restorationId={7} role="technician" setName="Ardent 5" view="ledger" onViewChange={() => {}} />,
    );
    await user.click(await screen.findByRole('button', { name: 'Record a part' }));
    expect(screen.getByRole('form', { name: 'Record a part' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Edit C16' }));
    expect(screen.getByRole('form', { name: 'Change part C16' })).toBeInTheDocument();
    expect(screen.getByLabelText('Quantity')).toHaveValue('2');
  });

  it('when the shopping list shows, then planned and ordered parts to buy are grouped by part and rating with their total', async () => {
    fakePartsApi(parts);
    const print = vi.fn();
    vi.stubGlobal('print', print);
    const user = userEvent.setup();
    renderWithQueries(
      <PartsTab restorationId={7} role="technician" setName="Ardent 5" view="shopping" onViewChange={() => {}} />,
    );
    const toOrder = await screen.findByRole('region', { name: 'To order' });
    const toOrderRows = within(toOrder).getAllByRole('row').slice(1);
    expect(toOrderRows).toHaveLength(1);
    expect(toOrderRows[0]).toHaveTextContent(/3\s*Radial\s*33µF 500V\s*C15, C16/);
    const onOrder = screen.getByRole('region', { name: 'On order' });
    expect(within(onOrder).getAllByRole('row')[1]).toHaveTextContent(/1\s*Film\s*0.047µF 630V\s*C4\s*new, supplier/);
    expect(screen.queryByText(/C9|R12/)).not.toBeInTheDocument();
    expect(screen.queryByText(/Danger/)).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Print' }));
    expect(print).toHaveBeenCalledOnce();
  });

  it('when a part to buy carries a danger warning, then its line on the shopping list says so', async () => {
    fakePartsApi([makePart(1, { componentRef: 'C15', originalRating: '32µF 450V', replacementRating: '33µF 350V' })]);
    renderWithQueries(
      <PartsTab restorationId={7} role="technician" setName="Ardent 5" view="shopping" onViewChange={() => {}} />,
    );
    const line = within(await screen.findByRole('region', { name: 'To order' })).getAllByRole('row')[1];
    expect(line).toHaveTextContent('⚠ Danger: check the ledger');
  });

  it('when the view is switched, then the choice goes to the route', async () => {
    fakePartsApi(parts);
    const onViewChange = vi.fn();
    const user = userEvent.setup();
    renderWithQueries(
      <PartsTab restorationId={7} role="mentor" setName="Ardent 5" view="ledger" onViewChange={onViewChange} />,
    );
    expect(screen.getByRole('button', { name: 'Ledger' })).toHaveAttribute('aria-pressed', 'true');
    await user.click(screen.getByRole('button', { name: 'Shopping list' }));
    expect(onViewChange).toHaveBeenCalledWith('shopping');
  });
});
