import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { workshopSettingsSchema, type WorkshopSettings } from '../../../../shared/schemas/estimates';
import { api, apiGet } from '../../../lib/api-client';

export const workshopSettingsKey = ['workshop', 'settings'] as const;

/** The workshop's currency, prices, tax and invoice prefix (its technicians only). */
export const useWorkshopSettings = () =>
  useQuery({ queryKey: workshopSettingsKey, queryFn: () => apiGet('/workshop/settings', workshopSettingsSchema) });

export function useSaveWorkshopSettings() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: WorkshopSettings) =>
      api('/workshop/settings', { method: 'PUT', json: input, schema: workshopSettingsSchema }),
    onSuccess: (saved) => {
      client.setQueryData(workshopSettingsKey, saved);
      // Every set's form reads the prices through its own money-settings query.
      return client.invalidateQueries({
        predicate: (q) => q.queryKey[0] === 'meta' || q.queryKey[2] === 'money-settings' || q.queryKey[3] === 'preview',
      });
    },
  });
}
