import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Notification } from '../../../../shared/schemas/notifications';
import { api } from '../../../lib/api-client';
import { findingKeys } from './keys';

/** The newest page only: the menu shows the latest items. */
export const getNotifications = () => api<Notification[]>('/notifications?limit=50');
export const markNotificationsRead = (ids?: number[]) => api<void>('/notifications/read', { method: 'POST', json: { ids } });

export const notificationsQueryOptions = () =>
  queryOptions({ queryKey: findingKeys.notifications, queryFn: getNotifications, refetchInterval: 30_000 });

export const useNotifications = () => useQuery(notificationsQueryOptions());

export function useMarkNotificationsRead() {
  const client = useQueryClient();
  return useMutation({ mutationFn: markNotificationsRead, onSuccess: () => client.invalidateQueries({ queryKey: findingKeys.notifications }) });
}
