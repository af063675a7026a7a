import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { benchHelpRequestSchema } from '../../../../shared/schemas/help';
import { apiGet } from '../../../lib/api-client';

/** Help requests on every set where the person is a technician or mentor, newest first. */
export const getBenchHelpRequests = () => apiGet('/help-requests', z.array(benchHelpRequestSchema));

export const benchHelpRequestsQueryOptions = () =>
  queryOptions({ queryKey: ['help-requests'] as const, queryFn: getBenchHelpRequests });

export const useBenchHelpRequests = () => useQuery(benchHelpRequestsQueryOptions());
