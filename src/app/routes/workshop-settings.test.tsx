// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { WorkshopSettings } from '../../../shared/schemas/estimates';
import type { WorkshopAdmins } from '../../../shared/schemas/workshop';
import { created, fakeApi, ok } from '../../testing/fake-api';
import { renderWithQueries } from '../../testing/render';
import { WorkshopSettingsRoute } from './workshop-settings';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const settings: WorkshopSettings = {
  currency: 'GBP',
  labourRate: 4000,
  partsMarkupBasisPoints: 2500,
  taxName: 'VAT',
  taxRateBasisPoints: null,
  taxRounding: 'invoice-down',
  estimateApprovalRequired: false,
  invoicePrefix: 'CL-',
  timeZone: 'Europe/London',
};
const mara = { id: 1, name: 'Mara Ellingsworth', email: 'mara@cobbold-lane.test' };
const tobias = { id: 2, name: 'Tobias Wren-Hale', email: 'tobias@cobbold-lane.test' };

describe('the workshop settings page', () => {
  it('when a technician is not an administrator, then the settings are read-only and the administrators are named', async () => {
    const admins: WorkshopAdmins = { admins: [{ ...mara, email: null }], youAreAdmin: false };
    fakeApi(({ path }) =>
      path === '/workshop/settings' ? ok(settings) : path === '/workshop/admins' ? ok(admins) : undefined,
    );
    renderWithQueries(<WorkshopSettingsRoute />);
    expect(await screen.findByRole('note')).toHaveTextContent(
      "You can read these settings; only the workshop's administrators change them: Mara Ellingsworth.",
    );
    expect(screen.getByLabelText('Labour rate per hour')).toBeDisabled();
    expect(screen.queryByRole('button', { name: 'Save the settings' })).not.toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'Add an administrator' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Remove/ })).not.toBeInTheDocument();
  });

  it('when an administrator adds a colleague and removes another, then each is sent once, the removal after asking', async () => {
    let admins: WorkshopAdmins = { admins: [mara], youAreAdmin: true };
    const api = fakeApi(({ method, path, body }) => {
      if (path === '/workshop/settings') return ok(settings);
      if (path === '/workshop/admins' && method === 'GET') return ok(admins);
      if (path === '/workshop/admins' && method === 'POST') {
        expect(body).toEqual({ email: tobias.email });
        admins = { admins: [mara, tobias], youAreAdmin: true };
        return created(admins);
      }
      if (path === `/workshop/admins/${tobias.id}` && method === 'DELETE') {
        admins = { admins: [mara], youAreAdmin: true };
        return ok(admins);
      }
      return undefined;
    });
    renderWithQueries(<WorkshopSettingsRoute />);
    const user = userEvent.setup();
    expect(await screen.findByLabelText('Labour rate per hour')).toBeEnabled();
    // The only administrator cannot be removed.
    expect(screen.queryByRole('button', { name: /^Remove/ })).not.toBeInTheDocument();
    await user.type(screen.getByLabelText('Add an administrator by e-mail'), tobias.email);
    await user.click(screen.getByRole('button', { name: 'Add' }));
    const list = await screen.findByRole('list');
    expect(await within(list).findByText('Tobias Wren-Hale')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Remove Tobias Wren-Hale' }));
    await user.click(await screen.findByRole('button', { name: 'Remove' }));
    await vi.waitFor(() => expect(within(list).queryByText('Tobias Wren-Hale')).not.toBeInTheDocument());
    expect(api.calls.filter((c) => c.method !== 'GET').map((c) => `${c.method} ${c.path}`)).toEqual([
      'POST /workshop/admins',
      `DELETE /workshop/admins/${tobias.id}`,
    ]);
  });
});
