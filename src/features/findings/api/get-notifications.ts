import { z } from 'zod';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { notificationSchema } from '../../../../shared/schemas/notifications';
import { api, apiGet } from '../../../lib/api-client';
import { findingKeys } from '../../../lib/queries/finding-keys';

/** The newest page only: the menu shows the latest items. */
export const getNotifications = () => apiGet('/notifications?limit=50', z.array(notificationSchema));
export const markNotificationsRead = (ids?: number[]) =>
  api('/notifications/read', { method: 'POST', json: { ids }, noBody: true });

export const notificationsQueryOptions = () =>
  queryOptions({ queryKey: findingKeys.notifications, queryFn: getNotifications, refetchInterval: 30_000 });

export const useNotifications = () => useQuery(notificationsQueryOptions());

export function useMarkNotificationsRead() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: markNotificationsRead,
    onSuccess: () => client.invalidateQueries({ queryKey: findingKeys.notifications }),
  });
}
