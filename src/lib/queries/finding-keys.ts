/** Query keys follow the resource paths, so a mutation can invalidate exactly what it touched. */
export const findingKeys = {
  photo: (photoId: number) => ['photos', photoId, 'findings'] as const,
  restoration: (restorationId: number) => ['restorations', restorationId, 'findings'] as const,
  /** The photos list, which carries each photo's finding counts: marked stale (not refetched) by finding changes. */
  photoCounts: (restorationId: number) => ['restorations', restorationId, 'photos'] as const,
  comments: (findingId: number) => ['findings', findingId, 'comments'] as const,
  history: (findingId: number) => ['findings', findingId, 'history'] as const,
  notifications: ['notifications'] as const,
  questions: ['questions'] as const,
};
