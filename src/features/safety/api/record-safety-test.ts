import { useMutation, useQueryClient } from '@tanstack/react-query';
import { safetyTestSchema, type SafetyTestInput } from '../../../../shared/schemas/safety';
import { api } from '../../../lib/api-client';
import { invalidateSafety } from './keys';

/** Records a final safety test; the server judges each line. A 400 names the reading it could not read. */
export const recordSafetyTest = (restorationId: number, input: SafetyTestInput) =>
  api(`/restorations/${restorationId}/safety-tests`, { method: 'POST', json: input, schema: safetyTestSchema });

export function useRecordSafetyTest(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: SafetyTestInput) => recordSafetyTest(restorationId, input),
    onSuccess: () => invalidateSafety(client, restorationId),
  });
}
