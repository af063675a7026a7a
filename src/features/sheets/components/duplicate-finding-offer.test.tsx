// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, ok } from '../../../testing/fake-api';
import { makeFinding } from '../../../testing/finding-fixtures';
import { renderWithQueries } from '../../../testing/render';
import { DuplicateFindingOffer } from './duplicate-finding-offer';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// A whole finding as the API answers it: the client checks each answer against the shared schema.
const existing = makeFinding(4, {
  restorationId: 3,
  photoId: 7,
  number: 2,
  title: 'Cathode resistor scorched',
  componentRef: 'R23',
});

function show(typed: string, onAttached = vi.fn()) {
  const view = renderWithQueries(
    <DuplicateFindingOffer
      restorationId={3}
      photoId={8}
      typed={typed}
      mark={{
        shape: 'circle',
        points: [
          { x: 0.4, y: 0.5 },
          { x: 0.45, y: 0.5 },
        ],
      }}
      onAttached={onAttached}
    />,
    {
      path: '/new',
      routes: [{ path: '/restorations/:id/photos/:photoId/findings/:findingId', element: <p>the existing finding</p> }],
    },
  );
  return { router: view.router!, onAttached };
}

describe('a second finding for the same part', () => {
  it('when R23 already has a finding, then attaching posts a location mark on this photo and opens that finding', async () => {
    const api = fakeApi((call) =>
      call.method === 'POST'
        ? {
            status: 201,
            body: {
              id: 11,
              restorationId: 3,
              sheetPageId: null,
              createdAt: '2026-12-01T10:00:00.000Z',
              ...(call.body as object),
            },
          }
        : call.path === '/restorations/3/findings'
          ? ok([existing])
          : undefined,
    );
    const { router, onAttached } = show('r23');
    // One notice: it names the finding, links to it and offers to attach.
    const notice = await screen.findByRole('group', { name: 'R23 already has a finding' });
    expect(within(notice).getByRole('status')).toHaveTextContent(
      'R23 already has finding #2, “Cathode resistor scorched”.',
    );
    expect(within(notice).getByRole('link', { name: 'Open #2' })).toHaveAttribute(
      'href',
      '/restorations/3/photos/7/findings/4',
    );
    expect(screen.getAllByRole('status')).toHaveLength(1);
    await userEvent.click(within(notice).getByRole('button', { name: 'Attach to #2' }));
    expect(api.calls.find((c) => c.method === 'POST')).toEqual({
      method: 'POST',
      path: '/restorations/3/reference-marks',
      body: { photoId: 8, ref: 'R23', shape: 'pin', points: [{ x: 0.4, y: 0.5 }] },
    });
    expect(await screen.findByText('the existing finding')).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/restorations/3/photos/7/findings/4');
    expect(onAttached).toHaveBeenCalled();
  });

  it('when no finding names the reference typed, then nothing is offered', async () => {
    const api = fakeApi((call) => (call.path === '/restorations/3/findings' ? ok([existing]) : undefined));
    show('C14');
    await vi.waitFor(() => expect(api.calls.some((c) => c.path === '/restorations/3/findings')).toBe(true));
    expect(screen.queryByRole('group', { name: /already has a finding/ })).not.toBeInTheDocument();
  });
});
