import { z } from 'zod';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { activityItemSchema } from '../../../../shared/schemas/events';
import { apiGet } from '../../../lib/api-client';

export const getActivity = () => apiGet('/activity', z.array(activityItemSchema));

export const activityQueryOptions = () =>
  queryOptions({ queryKey: ['activity'], queryFn: getActivity, staleTime: 30_000 });

export const useActivity = () => useQuery(activityQueryOptions());
