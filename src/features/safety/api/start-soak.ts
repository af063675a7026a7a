import { useMutation, useQueryClient } from '@tanstack/react-query';
import { soakLogSchema } from '../../../../shared/schemas/safety';
import { api } from '../../../lib/api-client';
import { safetyKeys } from './keys';

/** Starts a soak session now; 409 when one is already running. */
export const startSoak = (restorationId: number) =>
  api(`/restorations/${restorationId}/soak-sessions`, { method: 'POST', schema: soakLogSchema });

export function useStartSoak(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => startSoak(restorationId),
    onSuccess: (log) => client.setQueryData(safetyKeys.soak(restorationId), log),
  });
}
