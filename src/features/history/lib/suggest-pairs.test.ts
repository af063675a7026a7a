import { describe, expect, it } from 'vitest';
import type { Photo } from '../../../../shared/schemas/photos';
import { makePhoto } from '../../../testing/photo-fixtures';
import { latest, suggestPairs } from './suggest-pairs';

const at = (
  id: number,
  view: Photo['view'],
  phase: Photo['phase'],
  takenAt: string | null,
  uploadedAt = '2026-11-20T09:00:00.000Z',
) => makePhoto(id, { view, phase, takenAt, uploadedAt });

describe('suggestPairs', () => {
  it('when a view has a before and an after photo, then they are paired', () => {
    const pairs = suggestPairs([
      at(1, 'top', 'before', '2026-11-02T10:00:00Z'),
      at(2, 'top', 'after', '2026-11-30T10:00:00Z'),
    ]);
    expect(pairs.map((p) => [p.view, p.before.id, p.after.id])).toEqual([['top', 1, 2]]);
  });

  it('when a view has several of a phase, then the latest of each is chosen', () => {
    const pairs = suggestPairs([
      at(1, 'underside', 'before', '2026-11-02T10:00:00Z'),
      at(2, 'underside', 'before', '2026-11-03T10:00:00Z'),
      at(3, 'underside', 'after', '2026-12-01T10:00:00Z'),
      at(4, 'underside', 'after', '2026-11-29T10:00:00Z'),
    ]);
    expect(pairs.map((p) => [p.before.id, p.after.id])).toEqual([[2, 3]]);
  });

  it('when the camera gave no time, then the upload time decides', () => {
    const pairs = suggestPairs([
      at(1, 'rear', 'before', null, '2026-11-05T10:00:00Z'),
      at(2, 'rear', 'before', null, '2026-11-01T10:00:00Z'),
      at(3, 'rear', 'after', null, '2026-12-01T10:00:00Z'),
    ]);
    expect(pairs[0]?.before.id).toBe(1);
  });

  it('when views come in any order, then pairs follow the view order and views lacking a phase are skipped', () => {
    const pairs = suggestPairs([
      at(1, 'rear', 'after', '2026-12-01T10:00:00Z'),
      at(2, 'front', 'before', '2026-11-01T10:00:00Z'),
      at(3, 'rear', 'before', '2026-11-01T10:00:00Z'),
      at(4, 'top', 'after', '2026-12-01T10:00:00Z'),
      at(5, 'top', 'before', '2026-11-01T10:00:00Z'),
      at(6, 'detail', 'during', '2026-11-10T10:00:00Z'),
      at(7, 'detail', 'after', '2026-12-01T10:00:00Z'),
    ]);
    expect(pairs.map((p) => p.view)).toEqual(['top', 'rear']);
  });

  it('when there are no photos, then there are no pairs', () => {
    expect(suggestPairs([])).toEqual([]);
  });

  it('when two photos share a time, then the later upload counts as the latest', () => {
    expect(
      latest([at(8, 'top', 'after', '2026-12-01T10:00:00Z'), at(9, 'top', 'after', '2026-12-01T10:00:00Z')])?.id,
    ).toBe(9);
  });
});
