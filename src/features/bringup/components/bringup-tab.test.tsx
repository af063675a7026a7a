// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { intakeItems, prePowerItems, prePowerMissing, type Bringup } from '../../../../shared/schemas/bringup';
import type { Role } from '../../../../shared/permissions';
import { BringupTab } from './bringup-tab';
import { apiError, fakeApi, ok } from '../../../testing/fake-api';
import { renderWithQueries } from '../../../testing/render';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function record(status: 'done' | null, signed = false): Bringup {
  const items = prePowerItems.map((item) => ({ item, status, reason: '', checkedBy: status ? 'Ada Bench' : null }));
  return {
    intake: intakeItems.map((item) => ({
      item,
      done: false,
      note: '',
      findingId: null,
      photoId: null,
      checkedBy: null,
      checkedAt: null,
    })),
    prePower: {
      items,
      signedOff: signed ? { by: 'Ada Bench', at: '2026-11-30T09:00:00.000Z' } : null,
      missing: prePowerMissing(items),
    },
    steps: [],
  };
}

/** Stands in for the bring-up API; records every call. */
function fakeBringupApi(initial: Bringup | { status: number; message: string }) {
  return fakeApi(({ method, path }) => {
    if ('status' in initial) return apiError(initial.status, initial.message);
    if (method === 'POST' && path.endsWith('/sign-off')) return ok(record('done', true));
    return ok(initial);
  }).urlCalls;
}

const renderTab = (role: Role) =>
  renderWithQueries(<BringupTab restorationId={7} role={role} liveChassis />, { router: false });

describe('BringupTab', () => {
  it('when it loads, then it says so; when loading fails, then the error shows with a way to try again', async () => {
    fakeBringupApi({ status: 500, message: 'The database is asleep.' });
    renderTab('technician');
    expect(screen.getByRole('status')).toHaveTextContent(/Fetching the bring-up record/);
    expect(await screen.findByRole('alert')).toHaveTextContent('The database is asleep.');
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });

  it('when nothing is marked, then the sign-off waits, no step can be logged, and the empty log says what goes there', async () => {
    fakeBringupApi(record(null));
    renderTab('technician');
    expect(await screen.findByRole('button', { name: 'Sign off the pre-power checklist' })).toBeDisabled();
    expect(screen.getByText(/Not signed off/)).toBeInTheDocument();
    expect(screen.getByText('No power-up steps yet')).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'Log a power-up step' })).toBeNull();
    expect(screen.getByRole('note', { name: 'Power-up caution' })).toHaveTextContent(/licensed practice/);
    expect(screen.getByRole('note', { name: 'Discharging caution' })).toHaveTextContent(
      /Never rely on bleeder resistors/,
    );
  });

  it('when a technician marks an item waived, then the reason is asked for before it can be saved', async () => {
    const calls = fakeBringupApi(record(null));
    const user = userEvent.setup();
    renderTab('technician');
    const row = await screen.findByRole('group', { name: 'Discharge method at hand' });
    await user.click(within(row).getByRole('radio', { name: 'Waived' }));
    const save = screen.getByRole('button', { name: 'Save: discharge method at hand' });
    expect(save).toBeDisabled();
    await user.type(within(row).getByLabelText('Reason for waiving it'), 'Bench discharge tool lent out');
    await user.click(save);
    await waitFor(() =>
      expect(calls.find((c) => c.method === 'PUT')).toMatchObject({
        url: '/api/restorations/7/bringup/pre-power',
        body: { item: 'discharge-method', status: 'waived', reason: 'Bench discharge tool lent out' },
      }),
    );
  });

  it('when every item is marked, then the technician signs off and the step form appears', async () => {
    fakeBringupApi(record('done'));
    const user = userEvent.setup();
    renderTab('technician');
    await user.click(await screen.findByRole('button', { name: 'Sign off the pre-power checklist' }));
    expect(await screen.findByText(/Signed off by Ada Bench/)).toBeInTheDocument();
    expect(screen.getByRole('form', { name: 'Log a power-up step' })).toBeInTheDocument();
  });

  it('when an owner or a mentor reads it, then nothing can be changed or signed; the owner reads it in plain words', async () => {
    fakeBringupApi(record('done', true));
    renderTab('owner');
    expect(await screen.findByText(/The mains voltage setting matches the local supply: done/)).toBeInTheDocument();
    expect(screen.queryByRole('button')).toBeNull();
    cleanup();
    fakeBringupApi(record(null));
    renderTab('mentor');
    expect(await screen.findByText(/Mains tap matched to the local mains: not yet/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Sign off/ })).toBeNull();
    expect(screen.queryByRole('checkbox')).toBeNull();
  });
});
