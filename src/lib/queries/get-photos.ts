import { queryOptions, useQuery } from '@tanstack/react-query';
import { photoSchema } from '../../../shared/schemas/photos';
import { apiAllPages } from '../api-client';

export const getPhotos = (restorationId: number) => apiAllPages(`/restorations/${restorationId}/photos`, photoSchema);

export const photosQueryKey = (restorationId: number) => ['restorations', restorationId, 'photos'] as const;

/**
 * Each photo carries presigned URLs that expire after about five minutes. Two minutes of freshness plus a refetch
 * when the window regains focus keeps the URLs on screen valid; `refreshExpiredUrls` covers the rest.
 */
export const photosQueryOptions = (restorationId: number) =>
  queryOptions({
    queryKey: photosQueryKey(restorationId),
    queryFn: () => getPhotos(restorationId),
    staleTime: 2 * 60_000,
    refetchOnWindowFocus: true,
  });

export const usePhotos = (restorationId: number) => useQuery(photosQueryOptions(restorationId));
