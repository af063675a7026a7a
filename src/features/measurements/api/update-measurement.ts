import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { measurementSchema, type measurementPatchSchema } from '../../../../shared/schemas/measurements';
import { api } from '../../../lib/api-client';
import { invalidateReadings } from './keys';

export type MeasurementPatch = z.input<typeof measurementPatchSchema>;

/** Changes a reading; the server recomputes its verdict from the merged texts. */
export const updateMeasurement = (id: number, patch: MeasurementPatch) =>
  api(`/measurements/${id}`, { method: 'PATCH', json: patch, schema: measurementSchema });

export function useUpdateMeasurement(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, patch }: { id: number; patch: MeasurementPatch }) => updateMeasurement(id, patch),
    onSuccess: () => invalidateReadings(client, restorationId),
  });
}
