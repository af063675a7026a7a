// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { seriesLineUp } from '../testing/measurement-fixtures';
import { fakeReadingsApi } from '../testing/measurement-test-support';
import { renderWithQueries } from '../../../testing/render';
import { ValveLineUp } from './valve-line-up';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const caution =
  /Live chassis likely: series heaters mean the chassis may be connected to the mains\. Work only through an isolation transformer; treat every metal part as live; refit insulating knobs and covers\. Follow local codes and licensed practice\./;

describe('valve line-up', () => {
  it('when the line-up has series heaters, then each valve is decoded in words and the live-chassis caution stands out', async () => {
    fakeReadingsApi([], { lineUp: seriesLineUp });
    renderWithQueries(<ValveLineUp restorationId={7} role="mentor" />);
    const list = await screen.findByRole('list', { name: 'Valve line-up' });
    const v1 = within(list).getAllByRole('listitem')[0]!;
    expect(v1).toHaveTextContent('V1UCH42');
    expect(within(v1).getByText('100 mA series (14 V)')).toBeInTheDocument();
    expect(within(v1).getByText(/small-signal triode; hexode or heptode/)).toBeInTheDocument();
    expect(screen.getByRole('note')).toHaveTextContent(caution);
    expect(screen.getByText('UCH42: heater letter U is a series-string heater (100 mA)')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /line-up|List the valves/ })).not.toBeInTheDocument();
  });

  it('when an owner reads a series-heater line-up, then the live-chassis caution is in owner words, not the bench routine', async () => {
    fakeReadingsApi([], { lineUp: seriesLineUp });
    renderWithQueries(<ValveLineUp restorationId={7} role="owner" />);
    await screen.findByRole('list', { name: 'Valve line-up' });
    expect(screen.getByRole('note')).toHaveTextContent(/let only a competent person open it/);
    expect(screen.getByRole('note')).not.toHaveTextContent(/isolation transformer/);
    expect(screen.queryByRole('button', { name: /line-up|List the valves/ })).not.toBeInTheDocument();
  });

  it('when the restoration is already marked live, then the caution shows even for a parallel-heater line-up', async () => {
    fakeReadingsApi([], {
      lineUp: { valves: [{ position: 'V1', type: 'EL84', notes: '' }], liveChassis: { likely: false, reasons: [] } },
    });
    renderWithQueries(<ValveLineUp restorationId={7} role="mentor" liveChassis />);
    expect(await screen.findByText('6.3 V parallel')).toBeInTheDocument();
    expect(screen.getByRole('note')).toHaveTextContent(caution);
  });

  it('when a technician lists the valves, then types are decoded as typed, an American one is decoded too, and all are saved at once', async () => {
    const { calls } = fakeReadingsApi([]);
    const user = userEvent.setup();
    const { client } = renderWithQueries(<ValveLineUp restorationId={7} role="technician" />);
    const invalidate = vi.spyOn(client, 'invalidateQueries');
    await user.click(await screen.findByRole('button', { name: 'List the valves' }));
    expect(screen.queryByRole('note')).not.toBeInTheDocument();
    await user.type(screen.getByLabelText('Type of V1'), 'EL84');
    expect(screen.getByText('6.3 V parallel')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Add valve' }));
    await user.type(screen.getByLabelText('Type of V2'), '6V6GT');
    expect(screen.getByText('glass T-9 bulb (GT)')).toBeInTheDocument(); // RETMA numbering page: GT = glass T-9 bulb
    await user.click(screen.getByRole('button', { name: 'Add valve' }));
    await user.type(screen.getByLabelText('Type of V3'), 'UY41');
    expect(screen.getByRole('alert')).toHaveTextContent(caution);
    await user.click(screen.getByRole('button', { name: 'Save line-up' }));

    await waitFor(() => expect(calls.find((c) => c.method === 'PUT')).toBeDefined());
    expect(calls.find((c) => c.method === 'PUT')).toMatchObject({
      url: '/api/restorations/7/valves',
      body: {
        valves: [
          { position: 'V1', type: 'EL84', notes: '' },
          { position: 'V2', type: '6V6GT', notes: '' },
          { position: 'V3', type: 'UY41', notes: '' },
        ],
      },
    });
    expect(await screen.findByRole('list', { name: 'Valve line-up' })).toBeInTheDocument();
    expect(screen.getByRole('note')).toHaveTextContent(caution);
    expect(invalidate).toHaveBeenCalledWith({ queryKey: ['restorations', 7] });
  });

  it('when a row is left without a type, then it is marked and nothing is sent', async () => {
    const { calls } = fakeReadingsApi([]);
    const user = userEvent.setup();
    renderWithQueries(<ValveLineUp restorationId={7} role="technician" />);
    await user.click(await screen.findByRole('button', { name: 'List the valves' }));
    await user.click(screen.getByRole('button', { name: 'Save line-up' }));
    expect(within(screen.getByRole('listitem', { name: 'Valve V1' })).getByRole('alert')).toHaveTextContent(
      'Enter the type printed on the valve',
    );
    expect(calls.some((c) => c.method === 'PUT')).toBe(false);
  });
});
