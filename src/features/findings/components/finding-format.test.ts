import { describe, expect, it } from 'vitest';
import { describeChange, relativeTime } from './finding-format';
import { photoLabels } from './photo-labels';
import type { Photo } from '../../../../shared/schemas/photos';

describe('describeChange', () => {
  it('when a status changes, then it reads in words', () => {
    expect(describeChange('status', ['observed', 'confirmed'])).toBe('Status: Observed → Confirmed');
    expect(describeChange('kind', ['note', 'dry-joint'])).toBe('Kind: Note → Dry joint');
    expect(describeChange('componentRef', ['', 'C15b'])).toBe('Component: none → C15b');
  });

  it('when sharing, a question or the mark changes, then it reads as a sentence', () => {
    expect(describeChange('ownerVisible', [false, true])).toBe('Shared with the owner');
    expect(describeChange('questionOpen', [true, false])).toBe('Question resolved');
    expect(describeChange('points', [[], []])).toBe('Mark moved or reshaped');
  });
});

describe('relativeTime', () => {
  const now = Date.parse('2026-11-20T12:00:00.000Z');
  it('when something just happened, then it says so; later it counts in the largest whole unit', () => {
    expect(relativeTime('2026-11-20T11:59:40.000Z', now)).toBe('just now');
    expect(relativeTime('2026-11-20T11:55:00.000Z', now)).toBe('5 minutes ago');
    expect(relativeTime('2026-11-19T12:00:00.000Z', now)).toBe('yesterday');
    expect(relativeTime('not a date', now)).toBe('');
  });
});

describe('photoLabels', () => {
  const photo = (id: number, view: Photo['view'], phase: Photo['phase'], caption = '') =>
    ({ id, view, phase, caption }) as Photo;
  it('when photos are named, then view and phase are used, and the caption or a number tells twins apart', () => {
    expect(
      photoLabels([
        photo(1, 'underside', 'before'),
        photo(2, 'top', 'before', 'dial end'),
        photo(3, 'top', 'before'),
        photo(4, 'top', 'before'),
      ]),
    ).toEqual([
      { id: 1, label: 'Underside · before' },
      { id: 2, label: 'Top · before · dial end' },
      { id: 3, label: 'Top · before 2' },
      { id: 4, label: 'Top · before 3' },
    ]);
  });
});
