import { useMutation, useQueryClient } from '@tanstack/react-query';
import { helpRequestSchema, type HelpRequestPatch } from '../../../../shared/schemas/help';
import { api } from '../../../lib/api-client';
import { helpKeys } from './keys';

/** Changes the symptom or removes what is not relevant. */
export const updateHelpRequest = (helpRequestId: number, patch: HelpRequestPatch) =>
  api(`/help-requests/${helpRequestId}`, { method: 'PATCH', json: patch, schema: helpRequestSchema });

export function useUpdateHelpRequest(restorationId: number, helpRequestId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (patch: HelpRequestPatch) => updateHelpRequest(helpRequestId, patch),
    onSuccess: (updated) => {
      client.setQueryData(helpKeys.one(helpRequestId), updated);
      return client.invalidateQueries({ queryKey: helpKeys.list(restorationId) });
    },
  });
}
