import { useCallback } from 'react';

/** How old the list must be before a broken image is blamed on an expired URL rather than on the image. */
const MIN_AGE_MS = 60_000;

/**
 * For an image's `onError`: when the list's presigned URLs may have expired (the tab sat open), fetch the list
 * again. Several failing images share one request, and a fresh list is never refetched in a loop.
 */
export function useRefreshExpiredUrls(
  dataUpdatedAt: number,
  refetch: (options: { cancelRefetch: boolean }) => unknown,
) {
  return useCallback(() => {
    if (Date.now() - dataUpdatedAt > MIN_AGE_MS) void refetch({ cancelRefetch: false });
  }, [dataUpdatedAt, refetch]);
}
