import { useMutation, useQueryClient } from '@tanstack/react-query';
import { lineUpResultSchema, type LineUpInput } from '../../../../shared/schemas/measurements';
import { api } from '../../../lib/api-client';
import { measurementKeys } from './keys';

/** Replaces the whole line-up; series heaters mark the restoration live-chassis on the server. */
export const saveValves = (restorationId: number, lineUp: LineUpInput) =>
  api(`/restorations/${restorationId}/valves`, { method: 'PUT', json: lineUp, schema: lineUpResultSchema });

export function useSaveValves(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (lineUp: LineUpInput) => saveValves(restorationId, lineUp),
    onSuccess: (saved) => {
      client.setQueryData(measurementKeys.valves(restorationId), saved);
      // The restoration's liveChassis flag may have changed with the line-up.
      return client.invalidateQueries({ queryKey: measurementKeys.restorationItself(restorationId) });
    },
  });
}
