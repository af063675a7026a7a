import { views, type Photo, type View } from '../../../../shared/schemas/photos';

export interface PhotoPair {
  view: View;
  before: Photo;
  after: Photo;
}

/** When the photo was taken, as the camera says; failing that, when it arrived. */
export const photoTime = (p: Pick<Photo, 'takenAt' | 'uploadedAt'>): number => {
  const t = Date.parse(p.takenAt ?? p.uploadedAt);
  return Number.isNaN(t) ? 0 : t;
};

/** The most recent of the photos, or undefined; on a tie the higher id (the later upload) wins. */
export function latest(photos: Photo[]): Photo | undefined {
  let best: Photo | undefined;
  for (const p of photos) {
    if (!best || photoTime(p) > photoTime(best) || (photoTime(p) === photoTime(best) && p.id > best.id)) best = p;
  }
  return best;
}

/**
 * One before/after pair per view that has both: the latest "before" photo of that view against its latest "after"
 * photo, in the order views are listed (top, underside, rear, front, detail, schematic, other).
 */
export function suggestPairs(photos: Photo[]): PhotoPair[] {
  const pairs: PhotoPair[] = [];
  for (const view of views) {
    const ofView = photos.filter((p) => p.view === view);
    const before = latest(ofView.filter((p) => p.phase === 'before'));
    const after = latest(ofView.filter((p) => p.phase === 'after'));
    if (before && after) pairs.push({ view, before, after });
  }
  return pairs;
}
