// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { asOwnerSees, makePart } from '../testing/part-fixtures';
import { fakePartsApi, gate } from '../testing/parts-test-support';
import { renderWithQueries } from '../../../testing/render';
import { PartsLedger } from './parts-ledger';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  localStorage.clear();
});

const reservoir = makePart(1, {
  componentRef: 'C15',
  originalPart: 'Can electrolytic',
  originalRating: '32µF 450V',
  replacementPart: 'Radial electrolytic',
  replacementRating: '33µF 350V',
  costMinor: 185,
  source: 'new, supplier',
  state: 'planned',
});
const coupling = makePart(2, {
  componentRef: 'C2',
  originalRating: '0.05µF 400V',
  replacementRating: '0.047µF 630V',
  state: 'fitted',
  findingId: 40,
});
const bias = makePart(3, {
  componentRef: 'C10',
  originalRating: '25µF 25V',
  action: 'kept-original',
  state: 'ordered',
});
const row = (ref: string) => screen.getByRole('row', { name: `Part ${ref}` });

describe('parts ledger', () => {
  it('when the server warns about a part, then its row shows the warning with its glyph and word', async () => {
    fakePartsApi([reservoir]);
    renderWithQueries(<PartsLedger restorationId={7} role="technician" />);
    const item = within(await screen.findByRole('row', { name: 'Part C15' })).getByRole('listitem');
    expect(item).toHaveTextContent(
      "⚠ Danger: Rated 350 V, below the original's 450 V: never lower the voltage rating.",
    );
  });

  it('when a technician reads it, then costs show from minor units in the workshop currency', async () => {
    fakePartsApi([reservoir]);
    renderWithQueries(<PartsLedger restorationId={7} role="technician" />);
    expect(await screen.findByRole('columnheader', { name: /Cost/ })).toBeInTheDocument();
    expect(within(row('C15')).getByText('£1.85')).toBeInTheDocument();
    cleanup();
    fakePartsApi([reservoir], { currency: 'EUR' });
    renderWithQueries(<PartsLedger restorationId={7} role="technician" />);
    expect(within(await screen.findByRole('row', { name: 'Part C15' })).getByText('€1.85')).toBeInTheDocument();
  });

  it('when an owner reads it, then there is no cost or source column and no button to change a state', async () => {
    fakePartsApi([asOwnerSees(reservoir)]);
    renderWithQueries(<PartsLedger restorationId={7} role="owner" />);
    await screen.findByRole('row', { name: 'Part C15' });
    expect(screen.queryByRole('columnheader', { name: /Cost/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('columnheader', { name: /Source/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Mark / })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Edit/ })).not.toBeInTheDocument();
  });

  it('when a mentor reads it, then there is no cost column (mentors see no money), and no cost shows even if one were sent', async () => {
    fakePartsApi([reservoir]);
    renderWithQueries(<PartsLedger restorationId={7} role="mentor" />);
    await screen.findByRole('row', { name: 'Part C15' });
    expect(screen.getByRole('columnheader', { name: /Qty/ })).toBeInTheDocument();
    expect(screen.queryByRole('columnheader', { name: /Cost/ })).not.toBeInTheDocument();
    expect(screen.queryByText('£1.85')).not.toBeInTheDocument();
  });

  it('when listed, then rows go by reference as a schematic numbers them, and the state filter narrows them', async () => {
    fakePartsApi([reservoir, coupling, bias]);
    const user = userEvent.setup();
    renderWithQueries(
      <PartsLedger
        restorationId={7}
        role="technician"
        findings={[{ id: 40, number: 3, title: 'Leaky coupling cap' }]}
      />,
    );
    await screen.findByRole('row', { name: 'Part C15' });
    const refs = () => screen.getAllByRole('row', { name: /^Part / }).map((r) => r.getAttribute('aria-label'));
    expect(refs()).toEqual(['Part C2', 'Part C10', 'Part C15']);
    expect(within(row('C2')).getByText('#3')).toBeInTheDocument();
    await user.selectOptions(screen.getByLabelText('State'), 'fitted');
    expect(refs()).toEqual(['Part C2']);
    expect(screen.getByText('Showing 1 of 3 parts')).toBeInTheDocument();
  });

  it('when there are no parts, then it says what to record', async () => {
    fakePartsApi([]);
    renderWithQueries(<PartsLedger restorationId={7} role="technician" />);
    expect(await screen.findByText('No parts yet.')).toBeInTheDocument();
    expect(
      screen.getByText(
        'Record each change as you make it: the reference, what came out, what went in, and how it tested after.',
      ),
    ).toBeInTheDocument();
  });

  it('when a state is moved on, then it shows at once; when the server refuses (403), then it goes back and says why', async () => {
    const held = gate();
    const { calls } = fakePartsApi([reservoir], {
      holdChanges: held.promise,
      refuseChanges: { status: 403, message: 'Only technicians may change parts.' },
    });
    const user = userEvent.setup();
    renderWithQueries(<PartsLedger restorationId={7} role="technician" />);
    await user.click(await screen.findByRole('button', { name: 'Mark C15 ordered' }));
    expect(within(row('C15')).getByText('Ordered')).toBeInTheDocument();
    expect(within(row('C15')).queryByText('Planned')).not.toBeInTheDocument();
    expect(calls.find((c) => c.method === 'PATCH')).toEqual({
      method: 'PATCH',
      url: '/api/parts/1',
      body: { state: 'ordered' },
    });
    held.open();
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'C15 was not marked ordered and is back to planned: Only technicians may change parts.',
    );
    await waitFor(() => expect(within(row('C15')).getByText('Planned')).toBeInTheDocument());
    expect(within(row('C15')).getByRole('button', { name: 'Mark C15 ordered' })).toBeEnabled();
  });

  it('when the server accepts, then the state stays moved on and the next step is offered', async () => {
    fakePartsApi([reservoir]);
    const user = userEvent.setup();
    renderWithQueries(<PartsLedger restorationId={7} role="technician" />);
    await user.click(await screen.findByRole('button', { name: 'Mark C15 ordered' }));
    await user.click(await screen.findByRole('button', { name: 'Mark C15 fitted' }));
    await waitFor(() => expect(within(row('C15')).getByText('Fitted')).toBeInTheDocument());
    expect(within(row('C15')).queryByRole('button', { name: /^Mark / })).not.toBeInTheDocument();
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });
});
