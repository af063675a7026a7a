import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BenchHelpRequest } from '../../../../shared/schemas/help';
import { api } from '../../../lib/api-client';

/** Help requests on every set where the person is a technician or mentor, newest first. */
export const getBenchHelpRequests = () => api<BenchHelpRequest[]>('/help-requests');

export const benchHelpRequestsQueryOptions = () =>
  queryOptions({ queryKey: ['help-requests'] as const, queryFn: getBenchHelpRequests });

export const useBenchHelpRequests = () => useQuery(benchHelpRequestsQueryOptions());
