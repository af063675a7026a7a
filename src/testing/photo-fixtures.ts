import type { Photo } from '../../shared/schemas/photos';

/** A photo as the API answers it; tests override what they care about. */
export function makePhoto(id: number, overrides: Partial<Photo> = {}): Photo {
  return {
    id,
    restorationId: 7,
    view: 'top',
    phase: 'before',
    caption: '',
    ownerVisible: false,
    width: 4000,
    height: 3000,
    takenAt: `2026-11-0${(id % 9) + 1}T10:00:00.000Z`,
    uploadedAt: '2026-11-20T09:00:00.000Z',
    uploadedBy: 'Tessa Bench',
    contentType: 'image/jpeg',
    sizeBytes: 2_400_000,
    urls: { thumb: `/t/${id}.webp`, phone: `/p/${id}.webp`, display: `/d/${id}.webp`, original: `/o/${id}.jpg` },
    ...overrides,
  };
}
