// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Finding } from '../../../../shared/schemas/findings';
import { findingKeys } from '../../../lib/queries/finding-keys';
import { FindingPanel } from './finding-panel';
import { fakeApi, ok, type Reply, apiError } from '../../../testing/fake-api';
import { makeFinding, members } from '../../../testing/finding-fixtures';
import { renderWithQueries } from '../../../testing/render';
import { Thread } from './thread';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

const caution =
  /Before touching the chassis: switch off, unplug, discharge the filter capacitors and verify with a meter/;

/** The photo's list answers GET; PATCH waits for `release` and then gives `reply`. */
function photoApi(finding: Finding, reply: (body: Partial<Finding>) => Reply) {
  let release = () => {};
  const gate = new Promise<void>((resolve) => (release = resolve));
  const api = fakeApi(async ({ method, path, body }) => {
    if (method === 'GET' && path === `/photos/${finding.photoId}/findings`) return ok([finding]);
    if (method === 'GET' && path === `/findings/${finding.id}/history`)
      return ok([
        {
          id: 1,
          actorName: 'Tessa Bench',
          changes: { status: ['observed', 'confirmed'], ownerVisible: [false, true] },
          createdAt: finding.updatedAt,
        },
      ]);
    if (method === 'DELETE' && path === `/findings/${finding.id}`) return { status: 204 };
    if (method === 'GET' && path === `/findings/${finding.id}/comments`) return ok([]);
    if (method === 'PATCH' && path === `/findings/${finding.id}`) {
      await gate;
      return reply(body as Partial<Finding>);
    }
    return undefined;
  });
  return { ...api, release };
}

async function renderPanel(finding: Finding, role: 'technician' | 'mentor' | 'owner', meId = 1) {
  const view = renderWithQueries(
    <FindingPanel finding={finding} role={role} meId={meId} restorationId={7} members={members} />,
  );
  await waitFor(() => expect(view.client.getQueryData(findingKeys.photo(finding.photoId))).toBeDefined());
  return view;
}

describe('finding panel', () => {
  it('when a technician picks a status the server refuses, then it shows at once, then rolls back with the server’s words', async () => {
    const finding = makeFinding(4, { title: 'Wax capacitor by the output valve', componentRef: 'C15b' });
    const api = photoApi(finding, () => apiError(403, 'Only a technician changes a finding someone else placed.'));
    await renderPanel(finding, 'technician');
    const user = userEvent.setup();

    const status = screen.getByRole('group', { name: 'Status' });
    expect(
      within(status)
        .getAllByRole('button')
        .map((b) => b.textContent),
    ).toEqual(['•Observed', '?Suspected', '!Confirmed', '✓Repaired', '★Verified', '✕Dismiss…']);
    expect(within(status).getByRole('button', { name: /Observed/ })).toHaveAttribute('aria-pressed', 'true');
    expect(screen.queryByRole('note')).not.toBeInTheDocument();

    await user.click(within(status).getByRole('button', { name: /Confirmed/ }));
    expect(within(status).getByRole('button', { name: /Confirmed/ })).toHaveAttribute('aria-pressed', 'true');
    expect(within(status).getByRole('button', { name: /Observed/ })).toHaveAttribute('aria-pressed', 'false');
    expect(screen.getByRole('note')).toHaveTextContent(caution);
    expect(api.calls.at(-1)).toEqual({ method: 'PATCH', path: '/findings/4', body: { status: 'confirmed' } });

    api.release();
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'Only a technician changes a finding someone else placed.',
    );
    expect(within(status).getByRole('button', { name: /Observed/ })).toHaveAttribute('aria-pressed', 'true');
    expect(within(status).getByRole('button', { name: /Confirmed/ })).toHaveAttribute('aria-pressed', 'false');
    expect(screen.queryByRole('note')).not.toBeInTheDocument();
  });

  it('when the server accepts a status, then it stays and the header says it in a word beside its glyph', async () => {
    const finding = makeFinding(4);
    const api = photoApi(finding, (body) => ok({ ...finding, ...body, updatedAt: '2026-11-21T09:00:00.000Z' }));
    api.release();
    await renderPanel(finding, 'technician');
    await userEvent.setup().click(screen.getByRole('button', { name: /Repaired/ }));
    await waitFor(() => expect(api.calls.some((c) => c.method === 'PATCH')).toBe(true));
    expect(await screen.findByRole('button', { name: /Repaired/ })).toHaveAttribute('aria-pressed', 'true');
    expect(screen.getByText('#4').parentElement).toHaveTextContent('#4✓Repaired');
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('when a finding is dismissed, then a reason is asked for first and sent with it', async () => {
    const finding = makeFinding(4);
    const api = photoApi(finding, (body) => ok({ ...finding, ...body }));
    api.release();
    await renderPanel(finding, 'technician');
    const user = userEvent.setup();

    await user.click(screen.getByRole('button', { name: /Dismiss…/ }));
    await user.click(screen.getByRole('button', { name: 'Dismiss finding' }));
    expect(screen.getByLabelText('Why is this finding dismissed?')).toHaveAccessibleDescription(
      /Say why the finding is dismissed/,
    );
    expect(api.calls.some((c) => c.method === 'PATCH')).toBe(false);

    await user.type(screen.getByLabelText('Why is this finding dismissed?'), 'Tested 180 MΩ at 500 V: fine');
    await user.click(screen.getByRole('button', { name: 'Dismiss finding' }));
    expect(api.calls.find((c) => c.method === 'PATCH')?.body).toEqual({
      status: 'dismissed',
      dismissReason: 'Tested 180 MΩ at 500 V: fine',
    });
  });

  it('when a component reference is not written as the schematic prints it, then it is not sent and the field says why', async () => {
    const finding = makeFinding(4, { componentRef: 'R23' });
    const api = photoApi(finding, (body) => ok({ ...finding, ...body }));
    api.release();
    await renderPanel(finding, 'technician');
    const user = userEvent.setup();
    const ref = screen.getByLabelText('Component');

    await user.clear(ref);
    await user.type(ref, 'resistor 23{Enter}');
    expect(ref).toHaveAttribute('aria-invalid', 'true');
    expect(ref).toHaveAccessibleDescription(/e\.g\. C27, R20 or V5/);
    expect(api.calls.some((c) => c.method === 'PATCH')).toBe(false);

    await user.clear(ref);
    await user.type(ref, 'C15b');
    await user.tab();
    expect(api.calls.find((c) => c.method === 'PATCH')?.body).toEqual({ componentRef: 'C15b' });
  });

  it('when the severity is a hazard, then the caution is shown even before anything is confirmed', async () => {
    const finding = makeFinding(4, { severity: 'hazard', kind: 'hazard' });
    photoApi(finding, () => ok(finding)).release();
    await renderPanel(finding, 'mentor', 2);
    expect(screen.getByRole('note')).toHaveTextContent(
      /AC\/DC sets may have a live chassis\. Follow local codes and licensed practice\./,
    );
  });

  it('when an owner opens a hazard, then the caution is in owner words, not the bench routine', async () => {
    const finding = makeFinding(4, { severity: 'hazard', kind: 'hazard', ownerVisible: true });
    photoApi(finding, () => ok(finding)).release();
    await renderPanel(finding, 'owner', 3);
    expect(screen.getByRole('note')).toHaveTextContent(/let only a competent person open it/);
    expect(screen.getByRole('note')).not.toHaveTextContent(/switch off|unplug|discharge/);
  });

  it('when an owner opens a shared finding, then there are no edit controls, and the thread offers no internal choice', async () => {
    const finding = makeFinding(4, { ownerVisible: true, componentRef: 'V3', kind: 'overheated', severity: 'fault' });
    const api = photoApi(finding, () => ok(finding));
    renderWithQueries(
      <>
        <FindingPanel finding={finding} role="owner" meId={3} restorationId={7} members={members} />
        <Thread finding={finding} role="owner" meId={3} members={members} />
      </>,
    );
    expect(await screen.findByText('No comments yet')).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Finding 4' })).toBeInTheDocument();
    expect(screen.getByText('Overheated')).toBeInTheDocument();
    expect(screen.queryByRole('textbox', { name: 'Title' })).not.toBeInTheDocument();
    expect(screen.queryByRole('group', { name: 'Status' })).not.toBeInTheDocument();
    expect(screen.queryByRole('switch')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Delete|Ask the mentors|Resolve/ })).not.toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Add a comment' })).toBeInTheDocument();
    expect(screen.queryByRole('radio')).not.toBeInTheDocument();
    expect(screen.queryByText(/Internal/)).not.toBeInTheDocument();
    expect(api.calls.every((c) => c.method === 'GET')).toBe(true);
  });

  it('when a mentor views a technician’s finding with an open question, then they may only resolve it', async () => {
    const finding = makeFinding(4, { questionOpen: true });
    const api = photoApi(finding, (body) => ok({ ...finding, ...body }));
    api.release();
    await renderPanel(finding, 'mentor', 2);
    expect(screen.getByText('Open question')).toBeInTheDocument();
    expect(screen.queryByRole('group', { name: 'Status' })).not.toBeInTheDocument();
    expect(screen.queryByRole('switch')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Delete finding' })).not.toBeInTheDocument();
    await userEvent.setup().click(screen.getByRole('button', { name: /Resolve question/ }));
    expect(api.calls.find((c) => c.method === 'PATCH')?.body).toEqual({ questionOpen: false });
  });

  it('when a technician shares a finding, then the switch turns on and says the photo must be shared too', async () => {
    const finding = makeFinding(4);
    const api = photoApi(finding, (body) => ok({ ...finding, ...body }));
    await renderPanel(finding, 'technician');
    const share = screen.getByRole('switch', { name: 'Share with owner' });
    expect(share).toHaveAttribute('aria-checked', 'false');
    expect(share).toHaveAccessibleDescription(/The owner sees it only when its photo is shared too/);
    await userEvent.setup().click(share);
    expect(share).toHaveAttribute('aria-checked', 'true');
    expect(api.calls.at(-1)?.body).toEqual({ ownerVisible: true });
    api.release();
  });

  it('when History is opened, then each change reads in words with who made it', async () => {
    const finding = makeFinding(4);
    const api = photoApi(finding, () => ok(finding));
    await renderPanel(finding, 'technician');
    expect(api.calls.some((c) => c.path.endsWith('/history'))).toBe(false);
    await userEvent.setup().click(screen.getByText('History'));
    expect(await screen.findByText('Status: Observed → Confirmed')).toBeInTheDocument();
    expect(screen.getByText('Shared with the owner')).toBeInTheDocument();
    expect(screen.getByText(/^Tessa Bench ·/)).toBeInTheDocument();
  });

  it('when a technician deletes a finding, then it is confirmed first and the page is told once it is gone', async () => {
    const finding = makeFinding(4);
    const api = photoApi(finding, () => ok(finding));
    const onDeleted = vi.fn();
    const view = renderWithQueries(
      <FindingPanel
        finding={finding}
        role="technician"
        meId={1}
        restorationId={7}
        members={members}
        onDeleted={onDeleted}
      />,
    );
    await waitFor(() => expect(view.client.getQueryData(findingKeys.photo(3))).toBeDefined());
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: 'Delete finding' }));
    const asked = await screen.findByRole('dialog', { name: /^Delete finding #4/ });
    expect(asked).toHaveAccessibleDescription('Its thread and history are deleted with it.');
    expect(api.calls.some((c) => c.method === 'DELETE')).toBe(false);
    await user.click(within(asked).getByRole('button', { name: 'Delete finding' }));
    await waitFor(() => expect(onDeleted).toHaveBeenCalled());
    expect(api.calls).toContainEqual({ method: 'DELETE', path: '/findings/4', body: undefined });
  });
});
