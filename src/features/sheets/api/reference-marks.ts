import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { referenceMarkSchema, type ReferenceMarkInput } from '../../../../shared/schemas/sheets';
import { api, apiGet } from '../../../lib/api-client';
import { referencesQueryKey } from '../../../lib/queries/references';

export const referenceMarksQueryKey = (restorationId: number) =>
  ['restorations', restorationId, 'reference-marks'] as const;

/** Every reference mark of the restoration the reader may see (diagram pages and chassis photos). */
export const referenceMarksQueryOptions = (restorationId: number) =>
  queryOptions({
    queryKey: referenceMarksQueryKey(restorationId),
    queryFn: () => apiGet(`/restorations/${restorationId}/reference-marks`, z.array(referenceMarkSchema)),
  });
export const useReferenceMarks = (restorationId: number) => useQuery(referenceMarksQueryOptions(restorationId));

function useInvalidateReferences(restorationId: number) {
  const client = useQueryClient();
  return () =>
    Promise.all([
      client.invalidateQueries({ queryKey: referenceMarksQueryKey(restorationId) }),
      client.invalidateQueries({ queryKey: referencesQueryKey(restorationId) }),
    ]);
}

export function useCreateReferenceMark(restorationId: number) {
  const invalidate = useInvalidateReferences(restorationId);
  return useMutation({
    mutationFn: (input: ReferenceMarkInput) =>
      api(`/restorations/${restorationId}/reference-marks`, {
        method: 'POST',
        json: input,
        schema: referenceMarkSchema,
      }),
    onSettled: invalidate,
  });
}

export function useDeleteReferenceMark(restorationId: number) {
  const invalidate = useInvalidateReferences(restorationId);
  return useMutation({
    mutationFn: (id: number) => api(`/reference-marks/${id}`, { method: 'DELETE', noBody: true }),
    onSettled: invalidate,
  });
}
