import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { sheetPageSchema } from '../../../../shared/schemas/sheets';
import { apiGet } from '../../../lib/api-client';

export const sheetPagesQueryKey = (restorationId: number) => ['restorations', restorationId, 'sheets'] as const;

/** Pages carry presigned URLs that expire after about five minutes, like photos. */
export const sheetPagesQueryOptions = (restorationId: number) =>
  queryOptions({
    queryKey: sheetPagesQueryKey(restorationId),
    queryFn: () => apiGet(`/restorations/${restorationId}/sheets`, z.array(sheetPageSchema)),
    staleTime: 2 * 60_000,
    refetchOnWindowFocus: true,
  });

export const useSheetPages = (restorationId: number) => useQuery(sheetPagesQueryOptions(restorationId));
