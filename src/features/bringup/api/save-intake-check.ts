import { useMutation, useQueryClient } from '@tanstack/react-query';
import { bringupSchema, type IntakeCheckInput } from '../../../../shared/schemas/bringup';
import { api } from '../../../lib/api-client';
import { afterWrite } from './keys';

/** Ticks, notes or links one intake item. */
export const saveIntakeCheck = (restorationId: number, input: IntakeCheckInput) =>
  api(`/restorations/${restorationId}/bringup/intake`, { method: 'PUT', json: input, schema: bringupSchema });

export function useSaveIntakeCheck(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: IntakeCheckInput) => saveIntakeCheck(restorationId, input),
    onSuccess: (data) => afterWrite(client, restorationId, data),
  });
}
