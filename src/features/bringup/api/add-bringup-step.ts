import { useMutation, useQueryClient } from '@tanstack/react-query';
import { bringupSchema, type BringupStepInput } from '../../../../shared/schemas/bringup';
import { api } from '../../../lib/api-client';
import { afterWrite } from './keys';

/** Logs one power-up step with its readings; refused (409) until the pre-power checklist is signed off. */
export const addBringupStep = (restorationId: number, input: BringupStepInput) =>
  api(`/restorations/${restorationId}/bringup/steps`, { method: 'POST', json: input, schema: bringupSchema });

export function useAddBringupStep(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: BringupStepInput) => addBringupStep(restorationId, input),
    onSuccess: (data) => afterWrite(client, restorationId, data),
  });
}
