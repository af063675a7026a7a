import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { mismatchNoteSchema, type MismatchNoteInput, type MismatchNotePatch } from '../../../../shared/schemas/sheets';
import { api, apiGet } from '../../../lib/api-client';

export const mismatchNotesQueryKey = (restorationId: number) =>
  ['restorations', restorationId, 'mismatch-notes'] as const;

/** Every mismatch note of the restoration the reader may see (filtered here by reference when asked). */
export const useMismatchNotes = (restorationId: number) =>
  useQuery({
    queryKey: mismatchNotesQueryKey(restorationId),
    queryFn: () => apiGet(`/restorations/${restorationId}/mismatch-notes`, z.array(mismatchNoteSchema)),
  });

function useInvalidate(restorationId: number) {
  const client = useQueryClient();
  return () => client.invalidateQueries({ queryKey: mismatchNotesQueryKey(restorationId) });
}

export function useCreateMismatchNote(restorationId: number) {
  const invalidate = useInvalidate(restorationId);
  return useMutation({
    mutationFn: (input: MismatchNoteInput) =>
      api(`/restorations/${restorationId}/mismatch-notes`, { method: 'POST', json: input, schema: mismatchNoteSchema }),
    onSettled: invalidate,
  });
}

export function useUpdateMismatchNote(restorationId: number) {
  const invalidate = useInvalidate(restorationId);
  return useMutation({
    mutationFn: ({ id, patch }: { id: number; patch: MismatchNotePatch }) =>
      api(`/mismatch-notes/${id}`, { method: 'PATCH', json: patch, schema: mismatchNoteSchema }),
    onSettled: invalidate,
  });
}

export function useDeleteMismatchNote(restorationId: number) {
  const invalidate = useInvalidate(restorationId);
  return useMutation({
    mutationFn: (id: number) => api(`/mismatch-notes/${id}`, { method: 'DELETE', noBody: true }),
    onSettled: invalidate,
  });
}
