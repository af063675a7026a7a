import { useMutation, useQueryClient } from '@tanstack/react-query';
import { soakLogSchema, type SoakStop } from '../../../../shared/schemas/safety';
import { api } from '../../../lib/api-client';
import { invalidateSafety, safetyKeys } from './keys';

/** Stops the running session with what was seen; a fault opens a finding. */
export const stopSoak = (restorationId: number, input: SoakStop) =>
  api(`/restorations/${restorationId}/soak-sessions/running`, { method: 'PATCH', json: input, schema: soakLogSchema });

export function useStopSoak(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: SoakStop) => stopSoak(restorationId, input),
    onSuccess: (log) => {
      client.setQueryData(safetyKeys.soak(restorationId), log);
      return invalidateSafety(client, restorationId);
    },
  });
}
