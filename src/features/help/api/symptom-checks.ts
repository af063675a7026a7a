import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { symptomCheckSchema, type SymptomCheckInput } from '../../../../shared/schemas/symptom-checks';
import { api, apiGet } from '../../../lib/api-client';
import { helpKeys } from './keys';

/** The checklist's results on one restoration. */
export const getSymptomChecks = (restorationId: number) =>
  apiGet(`/restorations/${restorationId}/symptom-checks`, z.array(symptomCheckSchema));

export const symptomChecksQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: helpKeys.checks(restorationId), queryFn: () => getSymptomChecks(restorationId) });

export const useSymptomChecks = (restorationId: number) => useQuery(symptomChecksQueryOptions(restorationId));

/** Ticks one cause off with its result, and files its reading or opens its finding with it. */
export const recordSymptomCheck = (
  restorationId: number,
  symptomId: string,
  causeId: string,
  input: SymptomCheckInput,
) =>
  api(`/restorations/${restorationId}/symptom-checks/${symptomId}/${causeId}`, {
    method: 'PUT',
    json: input,
    schema: symptomCheckSchema,
  });

export function useRecordSymptomCheck(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (v: { symptomId: string; causeId: string; input: SymptomCheckInput }) =>
      recordSymptomCheck(restorationId, v.symptomId, v.causeId, v.input),
    // A reading or a finding may have been filed too: their lists and the restoration's help requests are stale.
    onSuccess: () =>
      Promise.all([
        client.invalidateQueries({ queryKey: helpKeys.checks(restorationId) }),
        client.invalidateQueries({ queryKey: ['restorations', restorationId] }),
        client.invalidateQueries({ queryKey: ['help-requests'] }),
      ]),
  });
}
