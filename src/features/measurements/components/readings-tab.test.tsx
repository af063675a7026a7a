// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fivePoints, makeMeasurement } from '../testing/measurement-fixtures';
import { fakeReadingsApi } from '../testing/measurement-test-support';
import { renderWithQueries } from '../../../testing/render';
import { ReadingsTab } from './readings-tab';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// Worst-case ESR for new electrolytics at 100 kHz, 20 °C: 22 µF 25 V reads at most 2.1 Ω (widely circulated
// technicians' table, reproduced at glodark.com/design/esrchart.htm); 1.1 Ω is (1.1 − 2.1) / 2.1 = −47.6 % from it.
const esr = makeMeasurement(20, {
  location: 'C26',
  quantity: 'esr',
  expected: '22µ',
  rating: '25 V',
  reading: '1.1 Ω',
  ownerVisible: true,
});
const readingsTable = () => screen.getByRole('table', { name: 'All readings, newest first' });

describe('readings tab', () => {
  it('when an owner opens it, then there is no form and nothing to change, only what is shared', async () => {
    fakeReadingsApi([esr]);
    renderWithQueries(<ReadingsTab restorationId={7} role="owner" liveChassis={false} plotWidth={640} />);
    expect(await screen.findByRole('heading', { name: 'All readings' })).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'Record a reading' })).not.toBeInTheDocument();
    expect(
      screen.queryByRole('button', { name: /Save|Change|Delete|Enter a voltage chart|List the valves/ }),
    ).not.toBeInTheDocument();
    expect(within(readingsTable()).getByRole('rowheader', { name: /C26/ })).toBeInTheDocument();
  });

  it('when a technician opens it, then the form, the chart entry and the line-up editing are offered', async () => {
    fakeReadingsApi([]);
    renderWithQueries(<ReadingsTab restorationId={7} role="technician" liveChassis={false} plotWidth={640} />);
    expect(await screen.findByRole('form', { name: 'Record a reading' })).toBeInTheDocument();
    expect(screen.getByText('No readings yet')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Enter a voltage chart' })).toBeInTheDocument();
    expect(await screen.findByRole('button', { name: 'List the valves' })).toBeInTheDocument();
  });

  it('shows each reading with expected as typed, deviation, verdict glyph and word, the reason, and who and when', async () => {
    fakeReadingsApi([esr, ...fivePoints()]);
    renderWithQueries(<ReadingsTab restorationId={7} role="mentor" liveChassis={false} plotWidth={640} />);
    const row = (
      await within(await screen.findByRole('table', { name: 'All readings, newest first' })).findByRole('rowheader', {
        name: /C26/,
      })
    ).closest('tr') as HTMLElement;
    expect(within(row).getByText('ESR')).toBeInTheDocument();
    expect(within(row).getByText('22µ 25 V')).toHaveClass('font-mono');
    expect(within(row).getByText('1.1 Ω, within the 2.1 Ω maximum')).toBeInTheDocument();
    expect(within(row).getByText('within')).toHaveAttribute(
      'title',
      expect.stringMatching(/^Reads 1\.1 Ω against an expected maximum of 2\.1 Ω/),
    );
    expect(within(row).getByText('Ada Bench')).toBeInTheDocument();
    expect(within(row).queryByRole('button', { name: /Change|Delete/ })).not.toBeInTheDocument();
  });

  it('when a technician changes a reading in place, then the change is sent and the stored verdict replaces the old', async () => {
    const { calls } = fakeReadingsApi([esr]);
    const user = userEvent.setup();
    renderWithQueries(<ReadingsTab restorationId={7} role="technician" liveChassis={false} plotWidth={640} />);
    await user.click(await screen.findByRole('button', { name: 'Change the reading at C26' }));
    const form = screen.getByRole('form', { name: 'Change the reading at C26' });
    await user.clear(within(form).getByLabelText(/^Reading/));
    // Beyond double the table's 2.1 Ω: the table's own "be wary of more than double" rule.
    await user.type(within(form).getByLabelText(/^Reading/), '5 Ω');
    expect(within(form).getByText('out')).toBeInTheDocument();
    await user.click(within(form).getByRole('button', { name: 'Save changes' }));
    await waitFor(() =>
      expect(screen.queryByRole('form', { name: 'Change the reading at C26' })).not.toBeInTheDocument(),
    );
    expect(calls.find((c) => c.method === 'PATCH')).toMatchObject({
      url: '/api/measurements/20',
      body: { reading: '5 Ω', tolerance: '' },
    });
    const row = (await within(readingsTable()).findByText('5 Ω')).closest('tr') as HTMLElement;
    expect(within(row).getByText('out')).toBeInTheDocument();
  });

  it('when a technician deletes a reading, then it asks once more in place and then removes it', async () => {
    const { calls } = fakeReadingsApi([esr]);
    const user = userEvent.setup();
    renderWithQueries(<ReadingsTab restorationId={7} role="technician" liveChassis={false} plotWidth={640} />);
    await user.click(await screen.findByRole('button', { name: 'Delete the reading at C26' }));
    expect(calls.some((c) => c.method === 'DELETE')).toBe(false);
    await user.click(
      within(screen.getByRole('group', { name: 'Delete the reading at C26?' })).getByRole('button', {
        name: 'Delete it',
      }),
    );
    expect(await screen.findByText('No readings yet')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'DELETE')?.url).toBe('/api/measurements/20');
  });
});
