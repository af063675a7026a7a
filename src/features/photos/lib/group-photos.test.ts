import { describe, expect, it } from 'vitest';
import { makePhoto } from '../../../testing/photo-fixtures';
import { flattenGroups, groupPhotos } from './group-photos';

describe('groupPhotos', () => {
  it('when photos of several views and phases are mixed, then views follow the schema order and phases run before → during → after', () => {
    const groups = groupPhotos([
      makePhoto(1, { view: 'other', phase: 'after' }),
      makePhoto(2, { view: 'underside', phase: 'after' }),
      makePhoto(3, { view: 'underside', phase: 'before' }),
      makePhoto(4, { view: 'top', phase: 'during' }),
    ]);
    expect(groups.map((g) => [g.view, g.count, g.phases.map((p) => p.phase)])).toEqual([
      ['top', 1, ['during']],
      ['underside', 2, ['before', 'after']],
      ['other', 1, ['after']],
    ]);
  });

  it('when a photo has no camera date, then its upload time places it, and equal times fall back to the id', () => {
    const photos = [
      makePhoto(9, { takenAt: null, uploadedAt: '2026-11-01T08:00:00.000Z' }),
      makePhoto(8, { takenAt: '2026-11-01T09:00:00.000Z' }),
      makePhoto(7, { takenAt: '2026-11-01T09:00:00.000Z' }),
    ];
    expect(flattenGroups(groupPhotos(photos)).map((p) => p.id)).toEqual([9, 7, 8]);
  });

  it('when there are no photos, then there are no groups', () => {
    expect(groupPhotos([])).toEqual([]);
  });
});
