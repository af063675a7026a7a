import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateReadings } from './keys';

export const deleteMeasurement = (id: number) => api(`/measurements/${id}`, { method: 'DELETE', noBody: true });

export function useDeleteMeasurement(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => deleteMeasurement(id),
    onSuccess: () => invalidateReadings(client, restorationId),
  });
}
