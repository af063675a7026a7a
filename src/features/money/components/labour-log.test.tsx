// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { LabourLog as Log } from '../../../../shared/schemas/labour';
import { apiError, fakeApi, ok } from '../../../testing/fake-api';
import { renderWithQueries } from '../../../testing/render';
import { LabourLog } from './labour-log';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const entry = (over: Partial<Log['entries'][number]> = {}): Log['entries'][number] => ({
  id: 1,
  technician: 'Mara',
  findingId: null,
  stage: 'repair',
  note: 'Recap the audio stage',
  billable: true,
  startedAt: '2026-11-30T10:00:00.000Z',
  stoppedAt: '2026-11-30T11:30:00.000Z',
  minutes: 90,
  ...over,
});
const idle: Log = {
  entries: [entry()],
  running: null,
  week: [{ technician: 'Mara', minutes: 90, billableMinutes: 90 }],
};

const renderLog = () => renderWithQueries(<LabourLog restorationId={7} />);

describe('LabourLog', () => {
  it('when a timer is already running on the server, then a reload shows it running from its stored start, and stopping it posts the stop', async () => {
    const startedAt = new Date(Date.now() - (65 * 60 + 9) * 1000).toISOString();
    const running = {
      ...entry({ id: 2, stoppedAt: null, minutes: null, note: 'Align the IF' }),
      startedAt,
      restorationId: 7,
    };
    const api = fakeApi((c) =>
      c.path.endsWith('/findings')
        ? ok([])
        : c.method === 'GET'
          ? ok({ ...idle, running, entries: [running, ...idle.entries] })
          : ok({ ...idle, entries: [entry({ id: 2, minutes: 65 }), ...idle.entries] }),
    );
    renderLog();
    // 65 min 9 s since the stored start: the clock reads from the server's instant, not from the page load.
    expect(await screen.findByRole('timer')).toHaveTextContent(/^1:05:\d\d$/);
    await userEvent.click(screen.getByRole('button', { name: 'Stop the timer' }));
    await waitFor(() => expect(api.calls.some((c) => c.method === 'POST')).toBe(true));
    expect(api.calls.find((c) => c.method === 'POST')!.path).toBe('/restorations/7/labour/timer/stop');
    expect(await screen.findByRole('button', { name: 'Start the timer' })).toBeInTheDocument();
  });

  it('when the technician starts a timer for a stage, not billable, then the start carries that target', async () => {
    const api = fakeApi((c) =>
      c.path.endsWith('/findings')
        ? ok([])
        : c.method === 'GET'
          ? ok(idle)
          : {
              status: 201,
              body: {
                ...idle,
                running: {
                  ...entry({ id: 3, stoppedAt: null, minutes: null, billable: false, stage: 'assessment' }),
                  startedAt: new Date().toISOString(),
                  restorationId: 7,
                },
              },
            },
    );
    renderLog();
    const form = await screen.findByRole('form', { name: 'Start a timer' });
    await userEvent.selectOptions(form.querySelector('select')!, 'Assessment');
    await userEvent.click(screen.getAllByRole('checkbox', { name: 'Billable' })[0]!);
    await userEvent.click(screen.getByRole('button', { name: 'Start the timer' }));
    expect(await screen.findByRole('timer')).toBeInTheDocument();
    expect(api.calls.find((c) => c.method === 'POST')).toEqual({
      method: 'POST',
      path: '/restorations/7/labour/timer',
      body: { findingId: null, stage: 'assessment', note: '', billable: false },
    });
  });

  it('when hours are typed, then they are sent as whole minutes, and a wrong number is explained without sending', async () => {
    const api = fakeApi((c) =>
      c.path.endsWith('/findings') ? ok([]) : c.method === 'GET' ? ok(idle) : { status: 201, body: idle },
    );
    renderLog();
    const hours = await screen.findByLabelText('Hours');
    await userEvent.type(hours, 'two');
    await userEvent.click(screen.getByRole('button', { name: 'Add the hours' }));
    expect(screen.getByRole('alert')).toHaveTextContent('Type the hours as a number');
    await userEvent.clear(hours);
    await userEvent.type(hours, '1.25');
    await userEvent.click(screen.getByRole('button', { name: 'Add the hours' }));
    await waitFor(() => expect(api.calls.some((c) => c.method === 'POST')).toBe(true));
    expect(api.calls.find((c) => c.method === 'POST')!.body).toMatchObject({
      minutes: 75,
      stage: 'repair',
      findingId: null,
      billable: true,
    }); // 1.25 h × 60
  });

  it('when the log loads, then it shows this week per technician; a refused start shows the server’s reason', async () => {
    fakeApi((c) =>
      c.path.endsWith('/findings')
        ? ok([])
        : c.method === 'GET'
          ? ok(idle)
          : apiError(409, 'Your timer is already running: stop it before starting another.'),
    );
    renderLog();
    expect(await screen.findByText(/1\.5 h \(1\.5 h billable\)/)).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Start the timer' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('already running');
  });
});
