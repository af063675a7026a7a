// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fakeJsonApi, makeEvent } from '../testing/history-test-support';
import { renderWithQueries } from '../../../testing/render';
import { Timeline } from './timeline';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// Midday UTC, so each event stays on its calendar day in any reader's time zone but the farthest east.
const events = [
  makeEvent(5, {
    kind: 'finding-status',
    at: '2026-11-25T12:30:00.000Z',
    summary: '#2 C27 Leaky coupling capacitor: Confirmed → Repaired',
    findingId: 12,
    photoId: 3,
  }),
  makeEvent(4, { kind: 'part-fitted', at: '2026-11-25T11:00:00.000Z', summary: 'Part fitted: C27 22 nF 630 V' }),
  makeEvent(3, {
    kind: 'photo-added',
    at: '2026-11-24T14:00:00.000Z',
    summary: 'Photo added: Underside, before',
    photoId: 3,
    thumbUrl: '/t/3.webp',
  }),
  makeEvent(2, {
    kind: 'finding-opened',
    at: '2026-11-24T12:10:00.000Z',
    summary: 'Finding opened: #2 C27 Leaky coupling capacitor',
    findingId: 12,
    photoId: 3,
  }),
  makeEvent(1, {
    kind: 'photo-added',
    at: '2026-11-24T11:00:00.000Z',
    summary: 'Photo added: Top, before',
    photoId: 1,
    thumbUrl: '/t/1.webp',
  }),
];

async function showTimeline(list = events) {
  const api = fakeJsonApi({ '/restorations/7/events': list });
  renderWithQueries(<Timeline restorationId={7} />);
  await screen.findByRole('heading', { name: /^Wednesday 25 November/ });
  return api;
}

const dayOf = (label: RegExp) => screen.getByRole('heading', { name: label }).closest('li') as HTMLElement;

describe('timeline', () => {
  it('when events span two days, then they sit under one heading per day, newest day first', async () => {
    await showTimeline();
    const headings = screen.getAllByRole('heading', { level: 3 }).map((h) => h.textContent);
    expect(headings).toEqual([
      expect.stringMatching(/^Wednesday 25 November/),
      expect.stringMatching(/^Tuesday 24 November/),
    ]);
    expect(within(dayOf(/^Wednesday/)).getByText('Part fitted: C27 22 nF 630 V')).toBeInTheDocument();
    expect(within(dayOf(/^Tuesday/)).getAllByText(/^Photo added/)).toHaveLength(2);
    expect(within(dayOf(/^Tuesday/)).getAllByText(/Tessa Bench/)).toHaveLength(3);
  });

  it('when a finding event is shown, then its close-up loads lazily and links to the finding on its photo', async () => {
    await showTimeline();
    const link = within(dayOf(/^Tuesday/)).getByRole('link', { name: /Open the finding/ });
    expect(link).toHaveAttribute('href', '/restorations/7/photos/3/findings/12');
    const closeup = within(link).getByRole('img', { name: 'Close-up of the marked spot' });
    expect(closeup).toHaveAttribute('src', '/api/findings/12/closeup');
    expect(closeup).toHaveAttribute('loading', 'lazy');
    expect(screen.getAllByRole('link', { name: 'Open the photo' })[0]).toHaveAttribute(
      'href',
      '/restorations/7/photos/3',
    );
  });

  it('when kind chips are pressed, then only those kinds show, and pressing Everything brings all back', async () => {
    const user = userEvent.setup();
    await showTimeline();
    const chips = screen.getByRole('group', { name: 'Show events of these kinds' });
    const photos = within(chips).getByRole('button', { name: 'Photos 2' });
    expect(within(chips).getByRole('button', { name: 'Everything 5' })).toHaveAttribute('aria-pressed', 'true');
    expect(within(chips).queryByRole('button', { name: /Questions/ })).not.toBeInTheDocument();

    photos.focus();
    await user.keyboard('{Enter}');
    expect(photos).toHaveAttribute('aria-pressed', 'true');
    expect(screen.getAllByRole('heading', { level: 3 })).toHaveLength(1);
    expect(screen.queryByText(/^Part fitted/)).not.toBeInTheDocument();
    expect(screen.getByText('Showing 2 of 5 events')).toBeInTheDocument();

    await user.click(within(chips).getByRole('button', { name: 'Parts fitted 1' }));
    expect(screen.getByText('Part fitted: C27 22 nF 630 V')).toBeInTheDocument();
    expect(screen.queryByText(/^Finding opened/)).not.toBeInTheDocument();

    await user.click(within(chips).getByRole('button', { name: 'Everything 5' }));
    expect(photos).toHaveAttribute('aria-pressed', 'false');
    expect(screen.getByText(/^Finding opened/)).toBeInTheDocument();
  });

  it('when readings were judged out against a tolerance and against a limit, then one chip names both', async () => {
    const user = userEvent.setup();
    const outs = [
      makeEvent(7, {
        kind: 'measurement-out',
        at: '2026-11-25T12:00:00.000Z',
        summary: 'Over its limit: ESR at C26, over the 800 mΩ maximum',
      }),
      makeEvent(6, {
        kind: 'measurement-out',
        at: '2026-11-25T11:00:00.000Z',
        summary: 'Out of tolerance: DC voltage at V5 pin 7, 28 % over',
      }),
    ];
    await showTimeline([...outs, ...events]);
    const chips = screen.getByRole('group', { name: 'Show events of these kinds' });
    await user.click(within(chips).getByRole('button', { name: 'Readings outside tolerance or limit 2' }));
    expect(screen.getByText('Showing 2 of 7 events')).toBeInTheDocument();
    expect(screen.getByText(/^Over its limit: ESR at C26/)).toBeInTheDocument();
    expect(screen.queryByText(/^Photo added/)).not.toBeInTheDocument();
  });

  it('when nothing has happened, then it says so', async () => {
    fakeJsonApi({ '/restorations/7/events': [] });
    renderWithQueries(<Timeline restorationId={7} />);
    expect(await screen.findByText('Nothing has happened yet')).toBeInTheDocument();
  });

  it('when the history cannot be fetched, then the error is shown with a retry', async () => {
    fakeJsonApi({});
    renderWithQueries(<Timeline restorationId={7} />);
    expect(await screen.findByRole('alert')).toHaveTextContent('Not found.');
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
