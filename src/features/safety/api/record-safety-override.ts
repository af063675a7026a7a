import { useMutation, useQueryClient } from '@tanstack/react-query';
import { safetyOverrideSchema } from '../../../../shared/schemas/safety';
import { api } from '../../../lib/api-client';
import { invalidateSafety } from './keys';

/** Records a technician's decision to return the set without a passing safety test, with the reason. */
export const recordSafetyOverride = (restorationId: number, reason: string) =>
  api(`/restorations/${restorationId}/safety-override`, {
    method: 'POST',
    json: { reason },
    schema: safetyOverrideSchema,
  });

export function useRecordSafetyOverride(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (reason: string) => recordSafetyOverride(restorationId, reason),
    onSuccess: () => invalidateSafety(client, restorationId),
  });
}
