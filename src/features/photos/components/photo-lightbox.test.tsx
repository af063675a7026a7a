// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
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

const three = [
  makePhoto(1, { view: 'top', caption: 'as received' }),
  makePhoto(2, { view: 'underside', caption: 'wax capacitors' }),
  makePhoto(3, { view: 'rear', caption: 'mains tap' }),
];

async function openLibrary(role: 'technician' | 'mentor' = 'technician') {
  const api = fakePhotoApi(three);
  const user = userEvent.setup();
  renderWithQueries(<PhotoLibrary restorationId={7} role={role} />);
  await screen.findByRole('button', { name: 'Top, before: as received' });
  return { user, ...api };
}

describe('photo lightbox', () => {
  it('when opened with Enter, then ArrowRight moves in gallery order and Escape closes back to the thumbnail last shown', async () => {
    const { user } = await openLibrary();
    screen.getByRole('button', { name: 'Underside, before: wax capacitors' }).focus();
    await user.keyboard('{Enter}');

    const dialog = screen.getByRole('dialog', { name: 'Photo 2 of 3: Underside, before: wax capacitors' });
    expect(dialog).toHaveAttribute('aria-modal', 'true');
    expect(within(dialog).getByRole('img', { name: 'Underside, before: wax capacitors' })).toHaveAttribute(
      'srcset',
      expect.stringContaining('/d/2.webp '),
    );
    expect(within(dialog).getByRole('button', { name: 'Close' })).toHaveFocus();

    await user.keyboard('{ArrowRight}');
    expect(screen.getByRole('dialog')).toHaveAccessibleName('Photo 3 of 3: Rear, before: mains tap');
    await user.keyboard('{ArrowRight}'); // already the last: stays
    expect(screen.getByRole('dialog')).toHaveAccessibleName(/^Photo 3 of 3/);
    await user.keyboard('{ArrowLeft}{ArrowLeft}');
    expect(screen.getByRole('dialog')).toHaveAccessibleName(/^Photo 1 of 3/);
    await user.click(screen.getByRole('button', { name: 'Next photo' }));
    await user.click(screen.getByRole('button', { name: 'Next photo' }));

    await user.keyboard('{Escape}');
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Rear, before: mains tap' })).toHaveFocus();
  });

  it('when Tab is pressed past the last control, then focus stays inside the dialog', async () => {
    const { user } = await openLibrary();
    await user.click(screen.getByRole('button', { name: 'Top, before: as received' }));
    const dialog = screen.getByRole('dialog');
    for (let i = 0; i < 15; i++) {
      await user.tab();
      expect(dialog).toContainElement(document.activeElement as HTMLElement);
    }
    for (let i = 0; i < 5; i++) {
      await user.tab({ shift: true });
      expect(dialog).toContainElement(document.activeElement as HTMLElement);
    }
  });

  it('when a technician shares a photo, then the switch turns on at once and the change is sent', async () => {
    const { user, calls } = await openLibrary();
    await user.click(screen.getByRole('button', { name: 'Top, before: as received' }));
    const share = screen.getByRole('switch', { name: 'Share with owner' });
    expect(share).toHaveAttribute('aria-checked', 'false');

    await user.click(share);
    expect(share).toHaveAttribute('aria-checked', 'true');
    await waitFor(() =>
      expect(calls).toContainEqual({ method: 'PATCH', url: '/api/photos/1', body: { ownerVisible: true } }),
    );
    expect(await screen.findByText('Saved.')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Download original' })).toHaveAttribute('href', '/o/1.jpg');
  });

  it('when a technician moves a photo to another view, then the gallery regroups and the lightbox stays on it', async () => {
    const { user, calls } = await openLibrary();
    await user.click(screen.getByRole('button', { name: 'Top, before: as received' }));
    await user.selectOptions(within(screen.getByRole('dialog')).getByLabelText('View'), 'detail');
    expect(screen.getByRole('dialog')).toHaveAccessibleName('Photo 3 of 3: Detail, before: as received');
    await waitFor(() =>
      expect(calls).toContainEqual({ method: 'PATCH', url: '/api/photos/1', body: { view: 'detail' } }),
    );
  });

  it('when a technician deletes a photo, then it asks first, deletes, closes and focuses the next thumbnail', async () => {
    const { user, calls } = await openLibrary();
    await user.click(screen.getByRole('button', { name: 'Top, before: as received' }));
    await user.click(screen.getByRole('button', { name: 'Delete photo' }));
    expect(screen.getByText(/Delete this photo for good/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Keep it' })).toHaveFocus();
    expect(calls.some((c) => c.method === 'DELETE')).toBe(false);

    await user.click(screen.getByRole('button', { name: 'Delete' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(calls).toContainEqual({ method: 'DELETE', url: '/api/photos/1', body: undefined });
    expect(screen.queryByRole('button', { name: 'Top, before: as received' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Underside, before: wax capacitors' })).toHaveFocus();
  });

  it('when a photo is open, then a link leads to its markup page', async () => {
    const { user } = await openLibrary('mentor');
    await user.click(screen.getByRole('button', { name: 'Underside, before: wax capacitors' }));
    expect(within(screen.getByRole('dialog')).getByRole('link', { name: 'Mark up this photo' })).toHaveAttribute(
      'href',
      '/restorations/7/photos/2',
    );
  });

  it('when a mentor opens a photo, then it can be viewed but not edited', async () => {
    const { user } = await openLibrary('mentor');
    await user.click(screen.getByRole('button', { name: 'Top, before: as received' }));
    expect(screen.queryByRole('switch')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Delete photo' })).not.toBeInTheDocument();
  });
});
