import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ReferenceMark, ReferenceMarkInput } from '../../../../shared/schemas/sheets';
import { api } from '../../../lib/api-client';
import { referencesQueryKey } from '../../../lib/queries/references';

export const referenceMarksQueryKey = (restorationId: number) =>
  ['restorations', restorationId, 'reference-marks'] as const;

/** Every reference mark of the restoration the reader may see (diagram pages and chassis photos). */
export const referenceMarksQueryOptions = (restorationId: number) =>
  queryOptions({
    queryKey: referenceMarksQueryKey(restorationId),
    queryFn: () => api<ReferenceMark[]>(`/restorations/${restorationId}/reference-marks`),
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
      api<ReferenceMark>(`/restorations/${restorationId}/reference-marks`, { method: 'POST', json: input }),
    onSettled: invalidate,
  });
}

export function useDeleteReferenceMark(restorationId: number) {
  const invalidate = useInvalidateReferences(restorationId);
  return useMutation({
    mutationFn: (id: number) => api<void>(`/reference-marks/${id}`, { method: 'DELETE' }),
    onSettled: invalidate,
  });
}
