// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Role } from '../../../../shared/permissions';
import { ReportPanel } from './report-panel';
import { apiError, notFound, toResponse } from '../../../testing/fake-api';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

/** The send endpoint behind `fetch`, answering with `answer`, held back until `release` is called. */
function fakeSend(answer: () => Response) {
  let release = () => {};
  const held = new Promise<void>((resolve) => (release = resolve));
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    await held;
    return String(input) === '/api/restorations/7/report/send' && init.method === 'POST' ? answer() : toResponse(notFound());
  });
  vi.stubGlobal('fetch', fetchMock);
  return { fetchMock, release };
}

const renderPanel = (role: Role) =>
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { mutations: { retry: false } } })}>
      <ReportPanel restorationId={7} role={role} />
    </QueryClientProvider>,
  );

describe('report panel', () => {
  it('when a technician sends the report, then it shows it is sending, then who it was sent to', async () => {
    const { fetchMock, release } = fakeSend(() => json(200, { sentTo: ['owner@example.org'] }));
    const user = userEvent.setup();
    renderPanel('technician');
    await user.click(screen.getByRole('button', { name: 'E-mail it to the owner' }));
    expect(screen.getByRole('button', { name: 'Sending…' })).toBeDisabled();
    release();
    expect(await screen.findByText('Sent to owner@example.org.')).toBeInTheDocument();
    expect(fetchMock).toHaveBeenCalledOnce();
  });

  it('when there is no owner to send to (409), then the server’s message shows', async () => {
    const { release } = fakeSend(() => toResponse(apiError(409, 'No owner is on this restoration yet: invite them from the People tab first.')));
    release();
    const user = userEvent.setup();
    renderPanel('technician');
    await user.click(screen.getByRole('button', { name: 'E-mail it to the owner' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Not sent: No owner is on this restoration yet: invite them from the People tab first.');
  });

  it('when an owner or a mentor opens it, then they may download the report but not send it', () => {
    for (const role of ['owner', 'mentor'] as const) {
      renderPanel(role);
      expect(screen.getByRole('link', { name: 'Download the hand-back report (PDF)' })).toHaveAttribute('href', '/api/restorations/7/report.pdf');
      expect(screen.queryByRole('button', { name: 'E-mail it to the owner' })).not.toBeInTheDocument();
      expect(screen.getByText(/only what is shared with them/)).toBeInTheDocument();
      cleanup();
    }
  });
});
