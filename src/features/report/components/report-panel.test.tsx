// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Role } from '../../../../shared/permissions';
import { ReportPanel } from './report-panel';
import { apiError, fakeApi, ok, type Reply } from '../../../testing/fake-api';
import { renderWithQueries } from '../../../testing/render';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const preview = (warnings: { code: string; message: string }[] = []) => ({
  recipients: [{ name: 'Oona Owner', email: 'owner@example.org' }],
  subject: 'Your Farrowby Lark 3: the hand-back report',
  body: 'Hello Oona Owner,\n\nThe report is attached.',
  attachmentName: 'farrowby-lark-3-hand-back-report.pdf',
  pageCount: 4,
  warnings,
  sends: [],
});

/** The preview and send endpoints behind `fetch`; the send answers with `answer`, held back until `release` is called. */
function fakeSend(answer: () => Reply, warnings: { code: string; message: string }[] = []) {
  let release = () => {};
  const held = new Promise<void>((resolve) => (release = resolve));
  const { fetchMock } = fakeApi(async ({ method, path }) => {
    if (path === '/restorations/7/report/preview' && method === 'GET') return ok(preview(warnings));
    await held;
    return path === '/restorations/7/report/send' && method === 'POST' ? answer() : undefined;
  });
  return { fetchMock, release };
}

const renderPanel = (role: Role) => renderWithQueries(<ReportPanel restorationId={7} role={role} />, { router: false });

describe('report panel', () => {
  it('when a technician sends the report, then it shows it is sending, then who it was sent to', async () => {
    const { fetchMock, release } = fakeSend(() => ok({ sentTo: ['owner@example.org'], sendId: 1, warnings: [] }));
    const user = userEvent.setup();
    renderPanel('technician');
    await user.click(screen.getByRole('button', { name: 'E-mail it to the owner' }));
    expect(await screen.findByText('Oona Owner <owner@example.org>')).toBeInTheDocument();
    expect(screen.getByText('farrowby-lark-3-hand-back-report.pdf (4 pages)')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Send to the owner' }));
    expect(screen.getByRole('button', { name: 'Sending…' })).toBeDisabled();
    release();
    expect(await screen.findByText('Sent to owner@example.org.')).toBeInTheDocument();
    expect(
      fetchMock.mock.calls.filter(([, init]) => (init as RequestInit | undefined)?.method === 'POST'),
    ).toHaveLength(1);
  });

  it('when there is no owner to send to (409), then the server’s message shows', async () => {
    const { release } = fakeSend(() =>
      apiError(409, 'No owner is on this restoration yet: invite them from the People tab first.'),
    );
    release();
    const user = userEvent.setup();
    renderPanel('technician');
    await user.click(screen.getByRole('button', { name: 'E-mail it to the owner' }));
    await user.click(await screen.findByRole('button', { name: 'Send to the owner' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'Not sent: No owner is on this restoration yet: invite them from the People tab first.',
    );
  });

  it('when sending would be premature, then the preview lists the warnings and nothing is sent until "Send anyway"', async () => {
    const { fetchMock } = fakeSend(
      () =>
        ok({
          sentTo: ['owner@example.org'],
          sendId: 1,
          warnings: ['No final safety test is recorded; the report says so.', 'No soak run is recorded.'],
        }),
      [
        { code: 'no-passing-safety-test', message: 'No final safety test is recorded; the report says so.' },
        { code: 'no-soak', message: 'No soak run is recorded.' },
      ],
    );
    const user = userEvent.setup();
    renderPanel('technician');
    await user.click(screen.getByRole('button', { name: 'E-mail it to the owner' }));
    expect(await screen.findByText('No final safety test is recorded; the report says so.')).toBeInTheDocument();
    expect(screen.getByText('No soak run is recorded.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Send anyway' })).toBeEnabled();
    expect(fetchMock.mock.calls.some(([, init]) => (init as RequestInit | undefined)?.method === 'POST')).toBe(false);
  });

  it('when an owner or a mentor opens it, then they may download the report but not send it', () => {
    for (const role of ['owner', 'mentor'] as const) {
      renderPanel(role);
      expect(screen.getByRole('link', { name: 'Download the hand-back report (PDF)' })).toHaveAttribute(
        'href',
        '/api/restorations/7/report.pdf',
      );
      expect(screen.queryByRole('button', { name: 'E-mail it to the owner' })).not.toBeInTheDocument();
      expect(screen.getByText(/only what is shared with them/)).toBeInTheDocument();
      cleanup();
    }
  });
});
