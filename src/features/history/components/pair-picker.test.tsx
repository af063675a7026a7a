// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { makePhoto } from '../../../testing/photo-fixtures';
import { PairPicker } from './pair-picker';

afterEach(cleanup);

const photos = [
  makePhoto(1, { view: 'underside', phase: 'before', caption: 'as received', takenAt: '2026-11-02T10:00:00Z' }),
  makePhoto(2, { view: 'underside', phase: 'during', caption: 'half recapped', takenAt: '2026-11-10T10:00:00Z' }),
  makePhoto(3, { view: 'underside', phase: 'after', caption: 'finished', takenAt: '2026-11-30T10:00:00Z' }),
  makePhoto(4, { view: 'rear', phase: 'before', takenAt: '2026-11-02T10:00:00Z' }),
  makePhoto(5, { view: 'rear', phase: 'during', takenAt: '2026-11-12T10:00:00Z' }),
  makePhoto(6, { view: 'top', phase: 'before', takenAt: '2026-11-02T10:00:00Z' }),
];

describe('pair picker', () => {
  it('when opened, then it compares the oldest and newest photo of the first view that has two', () => {
    render(<PairPicker photos={photos} />);
    expect(screen.getByRole('combobox', { name: 'View' })).toHaveValue('underside');
    expect(screen.getAllByRole('option').map((o) => o.textContent)).toContain('Underside (3 photos)');
    expect(screen.queryByRole('option', { name: /^Top/ })).not.toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Before — Underside, before: as received' })).toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'After — Underside, after: finished' })).toBeInTheDocument();
  });

  it('when two photos of the view are chosen, then they are compared; the same photo twice is refused', async () => {
    const user = userEvent.setup();
    render(<PairPicker photos={photos} />);
    await user.selectOptions(
      screen.getByRole('combobox', { name: 'Right of the divider' }),
      'During · 10 Nov 2026 · half recapped',
    );
    expect(screen.getByRole('img', { name: 'After — Underside, during: half recapped' })).toBeInTheDocument();

    await user.selectOptions(
      screen.getByRole('combobox', { name: 'Left of the divider' }),
      'During · 10 Nov 2026 · half recapped',
    );
    expect(screen.getByText('Choose two different photos to compare them.')).toBeInTheDocument();
    expect(screen.queryByRole('slider')).not.toBeInTheDocument();

    await user.selectOptions(screen.getByRole('combobox', { name: 'View' }), 'rear');
    expect(screen.getByRole('img', { name: 'Before — Rear, before' })).toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'After — Rear, during' })).toBeInTheDocument();
  });

  it('when no view has two photos, then it says what is needed', () => {
    render(<PairPicker photos={[photos[5]!]} />);
    expect(screen.getByText(/needs two photos of the same view/)).toBeInTheDocument();
  });
});
