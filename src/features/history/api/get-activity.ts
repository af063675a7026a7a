import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ActivityItem } from '../../../../shared/schemas/events';
import { api } from '../../../lib/api-client';

export const getActivity = () => api<ActivityItem[]>('/activity');

export const activityQueryOptions = () => queryOptions({ queryKey: ['activity'], queryFn: getActivity, staleTime: 30_000 });

export const useActivity = () => useQuery(activityQueryOptions());
