import { useMutation, useQueryClient } from '@tanstack/react-query';
import { helpRequestSchema } from '../../../../shared/schemas/help';
import { api } from '../../../lib/api-client';
import { helpKeys } from './keys';

/** Starts a help request pre-filled from the restoration. */
export const createHelpRequest = (restorationId: number, symptom: string) =>
  api(`/restorations/${restorationId}/help-requests`, { method: 'POST', json: { symptom }, schema: helpRequestSchema });

export function useCreateHelpRequest(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (symptom: string) => createHelpRequest(restorationId, symptom),
    onSuccess: (created) => {
      client.setQueryData(helpKeys.one(created.id), created);
      return Promise.all([
        client.invalidateQueries({ queryKey: helpKeys.list(restorationId) }),
        client.invalidateQueries({ queryKey: ['help-requests'], exact: true }),
      ]);
    },
  });
}
