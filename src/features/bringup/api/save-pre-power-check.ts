import { useMutation, useQueryClient } from '@tanstack/react-query';
import { bringupSchema, type PrePowerCheckInput } from '../../../../shared/schemas/bringup';
import { api } from '../../../lib/api-client';
import { afterWrite } from './keys';

/** Marks one pre-power item done, not applicable or waived; after a sign-off this withdraws it. */
export const savePrePowerCheck = (restorationId: number, input: PrePowerCheckInput) =>
  api(`/restorations/${restorationId}/bringup/pre-power`, { method: 'PUT', json: input, schema: bringupSchema });

export function useSavePrePowerCheck(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: PrePowerCheckInput) => savePrePowerCheck(restorationId, input),
    onSuccess: (data) => afterWrite(client, restorationId, data),
  });
}
