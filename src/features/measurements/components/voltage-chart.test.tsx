// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fivePoints } from '../testing/measurement-fixtures';
import { fakeReadingsApi } from '../testing/measurement-test-support';
import { renderWithQueries } from '../../../testing/render';
import { VoltageChart } from './voltage-chart';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const chartTable = () => screen.getByRole('table', { name: 'Voltage chart' });
const rowOf = (location: string) =>
  within(chartTable()).getByRole('rowheader', { name: location }).closest('tr') as HTMLElement;

describe('voltage chart', () => {
  it('when one of five points is out of tolerance, then exactly that row is marked out and the plot’s summary names it', () => {
    fakeReadingsApi([]);
    renderWithQueries(<VoltageChart restorationId={7} role="owner" measurements={fivePoints()} plotWidth={640} />);

    const outRows = within(chartTable())
      .getAllByText('out')
      .map((el) => el.closest('tr'));
    expect(outRows).toEqual([rowOf('V5 pin 7')]);
    expect(within(rowOf('V5 pin 7')).getByText('+28.0 %')).toBeInTheDocument();
    for (const location of ['V5 pin 9', 'V5 pin 3', 'V1 pin 6', 'V4 pin 1'])
      expect(within(rowOf(location)).getByText('within')).toBeInTheDocument();

    const plot = screen.getByRole('img');
    expect(plot).toHaveAccessibleName(
      /^Voltage chart, 5 points: 4 within, 1 out\. Out of tolerance: V5 pin 7 reads 320 V against 250 V ±10 %\.$/,
    );
    // The plot draws every point, with the out one labelled by its glyph, not by colour alone.
    expect(plot.querySelector('svg')).not.toBeNull();
    expect(within(plot).getByText('✕ 320 V')).toBeInTheDocument();
    expect(within(plot).getAllByText(/^✓ /)).toHaveLength(4);
  });

  it('groups the points by valve, in order, and says which meter the chart assumes', () => {
    fakeReadingsApi([]);
    renderWithQueries(<VoltageChart restorationId={7} role="owner" measurements={fivePoints()} plotWidth={640} />);
    const groups = within(chartTable())
      .getAllByRole('rowheader')
      .filter((h) => h.getAttribute('scope') === 'rowgroup');
    expect(groups.map((g) => g.textContent)).toEqual(['V1', 'V4', 'V5']);
    expect(
      screen.getByText(
        /Charts assume the meter stated in the manual; a 20 kΩ\/V or digital meter reads anodes and screens high\./,
      ),
    ).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Enter a voltage chart' })).not.toBeInTheDocument();
  });

  it('when a technician enters a chart, then each filled row is sent once and a refused row stays with the server’s words', async () => {
    const { calls } = fakeReadingsApi([], { refuseLocations: ['V3 pin 2'] });
    const user = userEvent.setup();
    renderWithQueries(<VoltageChart restorationId={7} role="technician" measurements={[]} plotWidth={640} />);
    await user.click(screen.getByRole('button', { name: 'Enter a voltage chart' }));
    await user.type(screen.getByLabelText('Method'), '20 kΩ/V');

    const points = [
      ['V5 pin 7', '250 V', '10', '262 V'],
      ['V3 pin 2', '100 V', '', '98 V'],
      ['V2 pin 6', '90', '', '300 V'],
    ];
    for (const [i, values] of points.entries()) {
      if (i > 0) await user.click(screen.getByRole('button', { name: 'Add row' }));
      const row = i + 1;
      for (const [label, value] of ['Location', 'Expected', 'Tolerance (%)', 'Reading'].map(
        (l, j) => [l, values[j]!] as const,
      ))
        if (value) await user.type(screen.getByLabelText(`${label}, row ${row}`), value);
    }
    // The live verdict per row, before saving.
    expect(within(screen.getByRole('listitem', { name: 'Row 1' })).getByText('within')).toBeInTheDocument();
    expect(within(screen.getByRole('listitem', { name: 'Row 3' })).getByText('out')).toBeInTheDocument();
    expect(screen.getByText(/HT can kill/)).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: /^Save all/ }));
    await waitFor(() =>
      expect(screen.getByRole('status')).toHaveTextContent('2 points saved. The rows left need attention.'),
    );
    const posts = calls.filter((c) => c.method === 'POST');
    expect(posts.map((c) => (c.body as { location: string }).location)).toEqual(['V5 pin 7', 'V3 pin 2', 'V2 pin 6']);
    expect(posts[0]?.body).toMatchObject({
      quantity: 'dc-voltage',
      expected: '250 V',
      tolerance: '10',
      reading: '262 V',
      method: '20 kΩ/V',
    });
    const left = screen.getAllByRole('listitem', { name: /^Row / });
    expect(left).toHaveLength(1);
    expect(within(left[0]!).getByLabelText('Location, row 1')).toHaveValue('V3 pin 2');
    expect(within(left[0]!).getByRole('alert')).toHaveTextContent('Reading: the server would not take this one.');
  });
});
