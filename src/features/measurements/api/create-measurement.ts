import { useMutation, useQueryClient } from '@tanstack/react-query';
import { measurementSchema, type Measurement, type MeasurementInput } from '../../../../shared/schemas/measurements';
import { api } from '../../../lib/api-client';
import { invalidateReadings } from './keys';

/** Records one reading; the server parses the texts and stores its verdict. A 400 names the field it could not read. */
export const createMeasurement = (restorationId: number, input: MeasurementInput) =>
  api(`/restorations/${restorationId}/measurements`, { method: 'POST', json: input, schema: measurementSchema });

export function useCreateMeasurement(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: MeasurementInput) => createMeasurement(restorationId, input),
    onSuccess: () => invalidateReadings(client, restorationId),
  });
}

/** One request's outcome in a batch, in the order sent. */
export type BatchResult = { ok: true; measurement: Measurement } | { ok: false; message: string };

/**
 * Records several readings (a voltage chart), one POST each, so one bad row does not stop the rest.
 * Resolves with every row's outcome; the list is refreshed once at the end.
 */
export function useCreateMeasurements(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (inputs: MeasurementInput[]): Promise<BatchResult[]> => {
      const settled = await Promise.allSettled(inputs.map((input) => createMeasurement(restorationId, input)));
      return settled.map((s) =>
        s.status === 'fulfilled'
          ? { ok: true, measurement: s.value }
          : { ok: false, message: s.reason instanceof Error ? s.reason.message : 'Not saved.' },
      );
    },
    onSettled: () => invalidateReadings(client, restorationId),
  });
}
