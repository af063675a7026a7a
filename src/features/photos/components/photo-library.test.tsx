// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { makePhoto } from '../../../testing/photo-fixtures';
import { fakePhotoApi } from '../testing/photo-test-support';
import { renderWithQueries } from '../../../testing/render';
import { PhotoLibrary } from './photo-library';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// Deliberately out of order: the gallery, not the server, decides the order.
const mixed = [
  makePhoto(1, { view: 'rear', phase: 'after', caption: 'back panel refitted', ownerVisible: true }),
  makePhoto(2, { view: 'top', phase: 'during', caption: 'new can fitted' }),
  makePhoto(3, { view: 'top', phase: 'before', caption: 'as received' }),
  makePhoto(4, { view: 'underside', phase: 'before', caption: 'wax capacitors' }),
  makePhoto(5, { view: 'top', phase: 'after', ownerVisible: true }),
  makePhoto(6, { view: 'top', phase: 'before', caption: 'dial cord' }),
];

const text = (els: HTMLElement[]) => els.map((el) => el.textContent);

describe('photo gallery', () => {
  it('when photos arrive in any order, then they are grouped by view in the usual order, then by phase, with counts', async () => {
    fakePhotoApi(mixed);
    renderWithQueries(<PhotoLibrary restorationId={7} role="mentor" />);

    expect(await screen.findByRole('heading', { level: 3, name: /^Top/ })).toBeInTheDocument();
    expect(text(screen.getAllByRole('heading', { level: 3 }))).toEqual([
      'Top4 photos',
      'Underside1 photo',
      'Rear1 photo',
    ]);

    const top = screen.getByRole('region', { name: /^Top/ });
    expect(text(within(top).getAllByRole('heading', { level: 4 }))).toEqual([
      'Before2 photos',
      'During1 photo',
      'After1 photo',
    ]);
    // Oldest first inside a phase (photo 3 was taken before photo 6).
    expect(
      within(top)
        .getAllByRole('button')
        .map((b) => b.getAttribute('aria-label')),
    ).toEqual([
      'Top, before: as received',
      'Top, before: dial cord',
      'Top, during: new can fitted',
      'Top, after (shared with owner)',
    ]);
  });

  it('when a thumbnail is drawn, then it loads lazily at the photo’s aspect and marks sharing with a word, not colour alone', async () => {
    fakePhotoApi([makePhoto(1, { ownerVisible: true, width: 3000, height: 4000, caption: 'chassis top' })]);
    renderWithQueries(<PhotoLibrary restorationId={7} role="technician" />);

    const thumb = await screen.findByRole('button', { name: 'Top, before: chassis top (shared with owner)' });
    const img = thumb.querySelector('img');
    expect(img).toHaveAttribute('loading', 'lazy');
    expect(img).toHaveAttribute('width', '300');
    expect(img).toHaveAttribute('height', '400');
    expect(within(thumb).getByText('Shared')).toBeInTheDocument();
  });

  it('when the list carries finding counts, then each thumbnail shows them by status and says them in words', async () => {
    fakePhotoApi([
      makePhoto(1, { caption: 'rectifier', findingCounts: { confirmed: 1, observed: 2 } }),
      makePhoto(2, { caption: 'dial', findingCounts: {} }),
    ]);
    renderWithQueries(<PhotoLibrary restorationId={7} role="technician" />);
    const thumb = await screen.findByRole('button', {
      name: 'Top, before: rectifier; findings: 2 observed, 1 confirmed',
    });
    // Counts in the order work moves, each after its status glyph (• observed, ! confirmed).
    expect([...thumb.querySelectorAll('.tabular-nums')].map((n) => n.textContent)).toEqual(['•2', '!1']);
    expect(screen.getByRole('button', { name: 'Top, before: dial; findings: no findings' })).toBeInTheDocument();
  });

  it('when an owner opens a shared photo, then there is no uploader and no edit, download or delete control', async () => {
    const { calls } = fakePhotoApi([
      makePhoto(1, { ownerVisible: true, urls: { thumb: '/t/1', phone: '/p/1', display: '/d/1' } }),
    ]);
    renderWithQueries(<PhotoLibrary restorationId={7} role="owner" />);

    await userEvent.setup().click(await screen.findByRole('button', { name: 'Top, before' }));
    const dialog = screen.getByRole('dialog');
    expect(within(dialog).getByRole('heading', { name: /Top · Before/ })).toBeInTheDocument();
    expect(within(dialog).queryByRole('switch')).not.toBeInTheDocument();
    expect(within(dialog).queryByLabelText('View')).not.toBeInTheDocument();
    expect(within(dialog).queryByRole('button', { name: 'Delete photo' })).not.toBeInTheDocument();
    expect(within(dialog).queryByRole('link', { name: 'Download original' })).not.toBeInTheDocument();
    expect(screen.queryByRole('heading', { name: 'Add photos' })).not.toBeInTheDocument();
    expect(calls.every((c) => c.method === 'GET')).toBe(true);
  });

  it('when nothing is shared with an owner, then the owner is told so', async () => {
    fakePhotoApi([]);
    renderWithQueries(<PhotoLibrary restorationId={7} role="owner" />);
    expect(await screen.findByText('Nothing shared with you yet')).toBeInTheDocument();
  });

  it('when a technician has no photos yet, then the empty state says to photograph before power, under the uploader and its caution', async () => {
    fakePhotoApi([]);
    renderWithQueries(<PhotoLibrary restorationId={7} role="technician" />);
    expect(
      await screen.findByText(/No photos yet — photograph everything before any power: top, underside, rear/),
    ).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Add photos' })).toBeInTheDocument();
    expect(screen.getByRole('note')).toHaveTextContent(/discharge the filter capacitors and verify with a meter/);
    expect(screen.getByRole('button', { name: 'Choose photos' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Take a photo' })).toBeInTheDocument();
  });

  it('when the list cannot be fetched, then the server’s words are shown with a way to try again', async () => {
    fakePhotoApi([], { failList: true });
    renderWithQueries(<PhotoLibrary restorationId={7} role="technician" />);
    expect(await screen.findByRole('alert')).toHaveTextContent('The photo store is not answering.');
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
