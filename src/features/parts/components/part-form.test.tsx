// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { makePart } from '../testing/part-fixtures';
import { fakePartsApi } from '../testing/parts-test-support';
import { renderWithQueries } from '../../../testing/render';
import { PartForm } from './part-form';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  localStorage.clear();
});

const preview = () => screen.getByRole('region', { name: 'Warnings preview' });
type User = ReturnType<typeof userEvent.setup>;

/** Pastes rather than types each text: the preview follows either way, and the test stays quick. */
async function fill(user: User, label: string, text: string) {
  await user.click(screen.getByLabelText(label));
  await user.paste(text);
}

async function typeChange(user: User, ref: string, original: string, replacement: string) {
  await fill(user, 'Component reference', ref);
  await fill(user, 'Original rating', original);
  await fill(user, 'Replacement rating', replacement);
}

// Never lower the voltage rating of a replacement capacitor: common practice in the trade.
describe('part form', () => {
  it('when 33µF 350V replaces 32µF 450V, then the preview warns of danger: a lower voltage rating', async () => {
    fakePartsApi([]);
    const user = userEvent.setup();
    renderWithQueries(<PartForm restorationId={7} />);
    await typeChange(user, 'C15', '32µF 450V', '33µF 350V');
    expect(preview()).toHaveTextContent(
      "⚠ Danger: Rated 350 V, below the original's 450 V: never lower the voltage rating.",
    );
  });

  it('when 33µF 500V replaces 32µF 350V, then the preview has no warning', async () => {
    fakePartsApi([]);
    const user = userEvent.setup();
    renderWithQueries(<PartForm restorationId={7} />);
    await typeChange(user, 'C16', '32µF 350V', '33µF 500V');
    expect(preview()).not.toHaveTextContent(/Danger|Caution/);
    expect(preview()).toHaveTextContent('No warnings from the ratings given.');
  });

  it('when a capacitor sits across the mains with no safety class named, then the preview asks for an X-class one', async () => {
    fakePartsApi([]);
    const user = userEvent.setup();
    renderWithQueries(<PartForm restorationId={7} />);
    await typeChange(user, 'C30', '0.01µF 1000V', '0.01µF 630V film');
    await user.selectOptions(screen.getByLabelText('Mains position'), 'across-line');
    expect(preview()).toHaveTextContent(
      '⚠ Danger: Across the mains this must be an X-class (or Y-class) safety capacitor; none is named.',
    );
    expect(screen.getByLabelText('Mains position')).toHaveAccessibleDescription(
      /Across the mains .* X-class .* to the chassis or earth needs a Y-class/,
    );
  });

  it('when a capacitor is replaced, then the recap caution shows; for a part kept original it does not', async () => {
    fakePartsApi([]);
    const user = userEvent.setup();
    renderWithQueries(<PartForm restorationId={7} />);
    await user.type(screen.getByLabelText('Component reference'), 'C15');
    expect(screen.getByRole('note')).toHaveTextContent(
      'Discharge the filter capacitors and verify with a meter before unsoldering; never lower a voltage rating; use X/Y-class safety capacitors where the mains connects. Follow local codes and licensed practice.',
    );
    await user.selectOptions(screen.getByLabelText('Action'), 'kept-original');
    expect(screen.queryByRole('note')).not.toBeInTheDocument();
  });

  it('when saved, then the line is sent with the cost in minor units and the finding chosen, and the form is ready for the next', async () => {
    const { calls } = fakePartsApi([]);
    const user = userEvent.setup();
    renderWithQueries(
      <PartForm restorationId={7} findings={[{ id: 40, number: 3, title: 'Bulging reservoir can' }]} />,
    );
    await typeChange(user, 'C15', '32µF 450V', '33µF 500V');
    await user.clear(screen.getByLabelText('Quantity'));
    await user.type(screen.getByLabelText('Quantity'), '2');
    await user.type(screen.getByLabelText('Cost of the line (GBP)'), '£1.85');
    await user.type(screen.getByLabelText('Source'), 'new, supplier');
    await user.selectOptions(screen.getByLabelText('Finding (optional)'), '40');
    await user.click(screen.getByRole('button', { name: 'Add to the ledger' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'POST')).toBe(true));
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({
      componentRef: 'C15',
      action: 'replaced',
      state: 'planned',
      originalPart: '',
      originalRating: '32µF 450V',
      replacementPart: '',
      replacementRating: '33µF 500V',
      mainsPosition: 'none',
      quantity: 2,
      costMinor: 185,
      source: 'new, supplier',
      testedAfter: '',
      notes: '',
      findingId: 40,
    });
    expect(await screen.findByRole('status')).toHaveTextContent('Saved.');
    expect(screen.getByLabelText('Component reference')).toHaveValue('');
    expect(screen.getByLabelText('Source')).toHaveValue('new, supplier');
  });

  it('when the cost has more decimals than the currency, or no reference is given, then nothing is sent and the fields say why', async () => {
    const { calls } = fakePartsApi([]);
    const user = userEvent.setup();
    renderWithQueries(<PartForm restorationId={7} />);
    await user.type(screen.getByLabelText('Cost of the line (GBP)'), '1.855');
    await user.click(screen.getByRole('button', { name: 'Add to the ledger' }));
    expect(await screen.findByText('At most 2 decimal places')).toBeInTheDocument();
    expect(screen.getByLabelText('Component reference')).toHaveAccessibleDescription(
      /Give the reference as the schematic prints it, e.g. C27/,
    );
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it('when a line is changed, then every field is sent to that part and the cost typed back in minor units', async () => {
    const part = makePart(5, {
      componentRef: 'C15',
      originalRating: '32µF 450V',
      replacementRating: '33µF 500V',
      costMinor: 185,
    });
    const { calls } = fakePartsApi([part]);
    const onDone = vi.fn();
    const user = userEvent.setup();
    renderWithQueries(<PartForm restorationId={7} part={part} onDone={onDone} />);
    expect(screen.getByLabelText('Cost of the line (GBP)')).toHaveValue('1.85');
    await user.selectOptions(screen.getByLabelText('State'), 'fitted');
    await user.type(screen.getByLabelText('Tested after'), 'Cathode 8.3 V, no red glow');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    const patch = calls.find((c) => c.method === 'PATCH');
    expect(patch?.url).toBe('/api/parts/5');
    expect(patch?.body).toMatchObject({
      state: 'fitted',
      testedAfter: 'Cathode 8.3 V, no red glow',
      costMinor: 185,
      findingId: null,
    });
  });
});

describe('a second line for the same reference', () => {
  it('when the reference typed is already on the ledger, then the form says so and links to the first line; another reference says nothing', async () => {
    fakePartsApi([
      makePart(12, { componentRef: 'C27', action: 'replaced' }),
      makePart(15, { componentRef: 'c27', action: 'replaced' }),
    ]);
    const user = userEvent.setup();
    renderWithQueries(<PartForm restorationId={7} />);
    await fill(user, 'Component reference', 'C27');
    const link = await screen.findByRole('link', { name: 'Go to that line' });
    expect(link).toHaveAttribute('href', '#part-12');
    expect(link.closest('p')).toHaveTextContent('The ledger already has a line for C27 (replaced).');
    await user.clear(screen.getByLabelText('Component reference'));
    await user.paste('R14');
    expect(screen.queryByRole('link', { name: 'Go to that line' })).not.toBeInTheDocument();
  });

  it('when the line being changed is the only one with its reference, then nothing is pointed out', async () => {
    const part = makePart(12, { componentRef: 'C27' });
    fakePartsApi([part]);
    renderWithQueries(<PartForm restorationId={7} part={part} />);
    await screen.findByLabelText('Component reference');
    await waitFor(() => expect(screen.getByLabelText('Component reference')).toHaveValue('C27'));
    expect(screen.queryByRole('link', { name: 'Go to that line' })).not.toBeInTheDocument();
  });
});
