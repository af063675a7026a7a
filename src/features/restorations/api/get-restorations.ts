import {
  infiniteQueryOptions,
  keepPreviousData,
  queryOptions,
  useInfiniteQuery,
  useQuery,
} from '@tanstack/react-query';
import { restorationSchema, type Restoration, type Stage } from '../../../../shared/schemas/restorations';
import { apiAllPages, apiPage } from '../../../lib/api-client';

export interface RestorationFilter {
  q?: string;
  stage?: Stage;
}

const pathOf = (filter: RestorationFilter) => {
  const params = new URLSearchParams();
  if (filter.q) params.set('q', filter.q);
  if (filter.stage) params.set('stage', filter.stage);
  const qs = params.toString();
  return `/restorations${qs ? `?${qs}` : ''}`;
};

/** Every restoration the caller is on (the owner's home: a person's own sets are few). */
export const getRestorations = (filter: RestorationFilter = {}): Promise<Restoration[]> =>
  apiAllPages(pathOf(filter), restorationSchema);

export const restorationsQueryOptions = (filter: RestorationFilter = {}) =>
  // While a search is typed, the previous list stays on screen instead of flashing to a spinner.
  queryOptions({
    queryKey: ['restorations', filter],
    queryFn: () => getRestorations(filter),
    placeholderData: keepPreviousData,
  });

export const useRestorations = (filter: RestorationFilter = {}) => useQuery(restorationsQueryOptions(filter));

/** The bench a page at a time (most recently changed first); `fetchNextPage` brings the next. */
export const benchPagesQueryOptions = (filter: RestorationFilter = {}) =>
  infiniteQueryOptions({
    queryKey: ['restorations', 'bench', filter],
    queryFn: ({ pageParam }) => apiPage(pathOf(filter), pageParam, restorationSchema),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.next,
    placeholderData: keepPreviousData,
  });

export const useBenchPages = (filter: RestorationFilter = {}) => useInfiniteQuery(benchPagesQueryOptions(filter));
