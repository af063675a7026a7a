// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Finding } from '../../../../shared/schemas/findings';
import { FindingsTable } from './findings-table';
import { fakeApi, ok, apiError } from '../../../testing/fake-api';
import { makeFinding } from '../../../testing/finding-fixtures';
import { renderWithQueries } from '../../../testing/render';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const photos = [
  { id: 3, label: 'Underside · before' },
  { id: 5, label: 'Top · before' },
];

const findings = [
  makeFinding(1, {
    number: 1,
    componentRef: 'R23',
    status: 'confirmed',
    severity: 'fault',
    kind: 'overheated',
    title: 'Charred anode load',
  }),
  makeFinding(2, {
    number: 2,
    componentRef: 'C15b',
    status: 'observed',
    severity: 'hazard',
    kind: 'leaking',
    title: 'Wax capacitor weeping',
    photoId: 5,
  }),
  makeFinding(3, {
    number: 3,
    componentRef: '',
    status: 'confirmed',
    severity: 'info',
    kind: 'note',
    title: 'Dial cord slipping',
    commentCount: 2,
  }),
  makeFinding(4, {
    number: 4,
    componentRef: 'R3',
    status: 'repaired',
    severity: 'wear',
    kind: 'dry-joint',
    title: 'Dry joint on tag strip',
  }),
];

function renderTable(list: Finding[] | 'fail' = findings) {
  fakeApi(({ path }) =>
    path === '/restorations/7/findings'
      ? list === 'fail'
        ? apiError(500, 'The notebook is not answering.')
        : ok(list)
      : undefined,
  );
  return renderWithQueries(<FindingsTable restorationId={7} photos={photos} />, {
    path: '/restorations/7/findings',
    showLocation: true,
  });
}

const table = () => screen.getByRole('table');
const titles = () =>
  within(table())
    .getAllByRole('row')
    .slice(1)
    .map((r) => r.querySelectorAll('td')[5]?.textContent);
const refs = () =>
  within(table())
    .getAllByRole('row')
    .slice(1)
    .map((r) => r.querySelectorAll('td')[4]?.textContent);

describe('findings table', () => {
  it('when findings arrive, then each row shows its number, status and severity in words with their marks, and the photo by name', async () => {
    renderTable();
    await screen.findByRole('table');
    expect(
      within(table())
        .getAllByRole('columnheader')
        .map((h) => h.textContent?.replace(/[▲▼↕]/g, '')),
    ).toEqual(['#', 'Status', 'Severity', 'Kind', 'Component', 'Title', 'Photo', 'Comments', 'Updated', 'Close-up']);
    const row = within(table()).getByRole('row', { name: /Wax capacitor weeping/ });
    expect(row).toHaveTextContent(
      /#2•Observed\s*Hazard\s*Leaking or bulging\s*C15b\s*Wax capacitor weeping\s*Top · before\s*0/,
    );
    expect(screen.getByRole('status')).toHaveTextContent('4 findings');
  });

  it('when a status is chosen, then only findings with that status remain', async () => {
    renderTable();
    await screen.findByRole('table');
    await userEvent.setup().selectOptions(screen.getByRole('combobox', { name: 'Status' }), 'Confirmed');
    expect(titles()).toEqual(['Charred anode load', 'Dial cord slipping']);
    expect(screen.getByRole('status')).toHaveTextContent('Showing 2 of 4 findings');
  });

  it('when part of a reference or a photo is chosen, then the rows narrow, and clearing brings them back', async () => {
    renderTable();
    await screen.findByRole('table');
    const user = userEvent.setup();
    await user.type(screen.getByRole('searchbox', { name: 'Component' }), 'r');
    expect(titles()).toEqual(['Charred anode load', 'Dry joint on tag strip']);
    await user.selectOptions(screen.getByRole('combobox', { name: 'Photo' }), 'Top · before');
    expect(screen.getByText('No findings match these filters')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Clear filters' }));
    expect(titles()).toHaveLength(4);
  });

  it('when the component header is clicked, then rows sort in schematic order with unreferenced findings last, and aria-sort says so', async () => {
    renderTable();
    await screen.findByRole('table');
    const user = userEvent.setup();
    const header = () => screen.getByRole('columnheader', { name: /Component/ });
    expect(header()).toHaveAttribute('aria-sort', 'none');
    expect(screen.getByRole('columnheader', { name: /#/ })).toHaveAttribute('aria-sort', 'ascending');

    await user.click(within(header()).getByRole('button'));
    expect(header()).toHaveAttribute('aria-sort', 'ascending');
    expect(refs()).toEqual(['C15b', 'R3', 'R23', '—']);

    await user.click(within(header()).getByRole('button'));
    expect(header()).toHaveAttribute('aria-sort', 'descending');
    expect(refs()).toEqual(['R23', 'R3', 'C15b', '—']);
  });

  it('when a row is clicked, or its title is followed from the keyboard, then the finding opens on its photo', async () => {
    renderTable();
    await screen.findByRole('table');
    const user = userEvent.setup();
    await user.click(within(within(table()).getByRole('row', { name: /Dry joint/ })).getByText('Wear'));
    expect(screen.getByTestId('location')).toHaveTextContent('/restorations/7/photos/3/findings/4');

    within(table()).getByRole('link', { name: 'Wax capacitor weeping' }).focus();
    await user.keyboard('{Enter}');
    expect(screen.getByTestId('location')).toHaveTextContent('/restorations/7/photos/5/findings/2');
  });

  it('when there are no findings, or they cannot be fetched, then it says so in words', async () => {
    renderTable([]);
    expect(await screen.findByText('No findings yet')).toBeInTheDocument();
    cleanup();
    renderTable('fail');
    expect(await screen.findByRole('alert')).toHaveTextContent('The notebook is not answering.');
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });

  it('when shown on a phone, then the same findings are also laid out as a list of links', async () => {
    renderTable();
    const cards = await screen.findByRole('list', { name: 'Findings' });
    expect(
      within(cards)
        .getAllByRole('link')
        .map((a) => a.getAttribute('href')),
    ).toEqual([
      '/restorations/7/photos/3/findings/1',
      '/restorations/7/photos/5/findings/2',
      '/restorations/7/photos/3/findings/3',
      '/restorations/7/photos/3/findings/4',
    ]);
  });
});
