import { queryOptions, useQuery } from '@tanstack/react-query';
import { timelineEventSchema, type TimelineEvent } from '../../../../shared/schemas/events';
import { apiAllPages } from '../../../lib/api-client';

export type EventKind = TimelineEvent['kind'];

export const getEvents = (restorationId: number, kind?: EventKind) =>
  apiAllPages(`/restorations/${restorationId}/events${kind ? `?kind=${kind}` : ''}`, timelineEventSchema);

export const eventsQueryKey = (restorationId: number, kind?: EventKind) =>
  kind
    ? (['restorations', restorationId, 'events', kind] as const)
    : (['restorations', restorationId, 'events'] as const);

/**
 * Photo events carry presigned thumbnail URLs that expire after about five minutes: the same freshness as the photo
 * list (two minutes, refetched when the window regains focus) keeps them loading.
 */
export const eventsQueryOptions = (restorationId: number, kind?: EventKind) =>
  queryOptions({
    queryKey: eventsQueryKey(restorationId, kind),
    queryFn: () => getEvents(restorationId, kind),
    staleTime: 2 * 60_000,
    refetchOnWindowFocus: true,
  });

export const useEvents = (restorationId: number, kind?: EventKind) => useQuery(eventsQueryOptions(restorationId, kind));
