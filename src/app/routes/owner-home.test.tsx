// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useSearchParams } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Finding } from '../../../shared/schemas/findings';
import type { Restoration } from '../../../shared/schemas/restorations';
import { BeforeAfter } from '../../features/history/components/before-after';
import { Timeline } from '../../features/history/components/timeline';
import { suggestPairs } from '../../features/history/lib/suggest-pairs';
import { makePhoto } from '../../testing/photo-fixtures';
import { heroPhoto, repairedFindings } from '../../features/owner/lib/owner-words';
import { OwnerHome } from '../../features/owner/components/owner-home';
import { OwnerSet } from '../../features/owner/components/owner-set';
import { OwnerSetCard } from '../../features/owner/components/owner-set-card';
import { RepairedFindings } from '../../features/owner/components/repaired-findings';
import type { TimelineEvent } from '../../../shared/schemas/events';
import { fakeApi, ok } from '../../testing/fake-api';
import { renderWithQueries } from '../../testing/render';
import { makeRestoration } from '../../testing/restoration-fixtures';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// An invented set and family.
const set = (id: number, overrides: Partial<Restoration> = {}) =>
  makeRestoration(id, {
    make: 'Aldermoor',
    model: 'Cantata',
    year: 1954,
    story: 'Bought by Grandad Ivo for the kitchen in 1955.',
    role: 'owner',
    ...overrides,
  });
const photos = [
  makePhoto(1, {
    view: 'front',
    phase: 'before',
    ownerVisible: true,
    caption: 'as it arrived',
    takenAt: '2026-11-02T10:00:00Z',
  }),
  makePhoto(2, {
    view: 'front',
    phase: 'after',
    ownerVisible: true,
    caption: 'cabinet waxed',
    takenAt: '2026-11-30T10:00:00Z',
  }),
];
const finding = (id: number, status: Finding['status']): Finding => ({
  id,
  photoId: 2,
  restorationId: 7,
  number: id,
  shape: 'pin',
  points: [{ x: 0.5, y: 0.5 }],
  title: 'Bulging filter can',
  componentRef: 'C30',
  kind: 'leaking',
  severity: 'fault',
  status,
  dismissReason: null,
  ownerVisible: true,
  authorId: 1,
  authorName: 'Tessa Bench',
  questionOpen: false,
  commentCount: 0,
  createdAt: '2026-11-20T09:00:00Z',
  updatedAt: '2026-11-20T09:00:00Z',
});
const findings = [finding(4, 'repaired'), finding(5, 'confirmed')];
const event = {
  id: 1,
  kind: 'stage-changed',
  at: '2026-11-24T12:00:00Z',
  actorName: 'Tessa Bench',
  summary: 'Stage: Assessment → Repair',
  photoId: null,
  findingId: null,
  thumbUrl: null,
  caution: false,
} satisfies TimelineEvent;

/** Composes the page the way the /home route does, with the photos and findings given and the timeline fetched. */
function showHome(sets: Restoration[], path = '/home') {
  fakeApi(() => ok([event]));
  const renderSet = (r: Restoration) => (
    <OwnerSet
      restoration={r}
      hero={heroPhoto(photos)}
      comparisons={suggestPairs(photos).map((p) => (
        <BeforeAfter key={p.view} before={p.before} after={p.after} />
      ))}
      repairs={<RepairedFindings findings={repairedFindings(findings)} />}
      timeline={<Timeline restorationId={r.id} />}
    />
  );
  const Page = () => {
    const selectedId = Number(useSearchParams()[0].get('set')) || undefined;
    return (
      <OwnerHome
        name="Mara Lind"
        sets={sets}
        selectedId={selectedId}
        renderSet={renderSet}
        renderCard={(r, to) => <OwnerSetCard restoration={r} hero={photos[1]} to={to} />}
        now={new Date(2026, 10, 24, 9)}
      />
    );
  };
  renderWithQueries(<Page />, { path });
}

describe("owner's home", () => {
  it('when the owner has one set, then it shows directly with its pair, repairs, history and the report link', async () => {
    showHome([set(7)]);
    expect(screen.getByRole('heading', { level: 1, name: 'Good morning, Mara' })).toBeInTheDocument();
    expect(screen.getByRole('heading', { level: 2, name: 'Aldermoor Cantata 1954' })).toBeInTheDocument();
    expect(screen.getByText('With the workshop: repair')).toBeInTheDocument();
    expect(screen.getByText('Bought by Grandad Ivo for the kitchen in 1955.')).toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Aldermoor Cantata: cabinet waxed' })).toHaveAttribute(
      'srcset',
      expect.stringContaining('/d/2.webp '),
    );

    const link = screen.getByRole('link', { name: 'Download the hand-back report (PDF)' });
    expect(link).toHaveAttribute('href', '/api/restorations/7/report.pdf');

    const pair = screen.getByRole('region', { name: 'Before and after' });
    expect(within(pair).getByRole('slider', { name: 'Before and after comparison' })).toHaveAttribute(
      'aria-valuenow',
      '50',
    );
    expect(within(pair).getByRole('img', { name: 'Before — Front, before: as it arrived' })).toHaveAttribute(
      'srcset',
      expect.stringContaining('/d/1.webp '),
    );
    expect(within(pair).getByRole('img', { name: 'After — Front, after: cabinet waxed' })).toHaveAttribute(
      'srcset',
      expect.stringContaining('/d/2.webp '),
    );

    const repairs = screen.getByRole('region', { name: 'What was put right' });
    expect(within(repairs).getAllByRole('link')).toHaveLength(1);
    expect(within(repairs).getByRole('link', { name: 'C30: Bulging filter can — repaired' })).toHaveAttribute(
      'href',
      '/restorations/7/photos/2/findings/4',
    );
    expect(repairs.querySelector('img')).toHaveAttribute('src', '/api/findings/4/closeup');

    expect(await screen.findByText('Stage: Assessment → Repair')).toBeInTheDocument();
    expect(screen.getByText(/Valve sets work at lethal voltages inside/)).toHaveTextContent(
      'Valve sets work at lethal voltages inside: keep the back on and let only a competent person open it. Follow local electrical codes.',
    );
  });

  it('when the owner has several sets, then each is a card, and a card opens that set', async () => {
    const user = userEvent.setup();
    showHome([set(7), set(8, { make: 'Brennet', model: 'Lark', stage: 'returned' })]);
    const cards = screen.getByRole('list', { name: 'Your sets' });
    expect(within(cards).getAllByRole('link')).toHaveLength(2);
    expect(within(cards).getByText('Ready to collect')).toBeInTheDocument();
    expect(screen.queryByRole('slider')).not.toBeInTheDocument();

    await user.click(within(cards).getByRole('link', { name: /Brennet Lark/ }));
    expect(screen.getByRole('heading', { level: 2, name: 'Brennet Lark 1954' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Download the hand-back report (PDF)' })).toHaveAttribute(
      'href',
      '/api/restorations/8/report.pdf',
    );
    await user.click(screen.getByRole('link', { name: /All your sets/ }));
    expect(screen.getByRole('list', { name: 'Your sets' })).toBeInTheDocument();
  });

  it('when nobody has invited them to follow a set, then the page says so calmly', () => {
    showHome([]);
    expect(screen.getByText('No sets to follow yet')).toBeInTheDocument();
  });
});
