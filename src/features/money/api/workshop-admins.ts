import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { workshopAdminsSchema } from '../../../../shared/schemas/workshop';
import { api, apiGet } from '../../../lib/api-client';

export const workshopAdminsKey = ['workshop', 'admins'] as const;

/** Who changes the workshop's settings, and whether the reader is one of them (decision 46). */
export const useWorkshopAdmins = () =>
  useQuery({ queryKey: workshopAdminsKey, queryFn: () => apiGet('/workshop/admins', workshopAdminsSchema) });

/** An administrator names another, by the address of a confirmed account. */
export function useAddWorkshopAdmin() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (email: string) =>
      api('/workshop/admins', { method: 'POST', json: { email }, schema: workshopAdminsSchema }),
    onSuccess: (answer) => client.setQueryData(workshopAdminsKey, answer),
  });
}

/** An administrator takes the role back from one (the server keeps at least one). */
export function useRemoveWorkshopAdmin() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (userId: number) =>
      api(`/workshop/admins/${userId}`, { method: 'DELETE', schema: workshopAdminsSchema }),
    onSuccess: (answer) => client.setQueryData(workshopAdminsKey, answer),
  });
}
