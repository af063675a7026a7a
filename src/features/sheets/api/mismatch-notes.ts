import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { MismatchNote, MismatchNoteInput, MismatchNotePatch } from '../../../../shared/schemas/sheets';
import { api } from '../../../lib/api-client';

export const mismatchNotesQueryKey = (restorationId: number) =>
  ['restorations', restorationId, 'mismatch-notes'] as const;

/** Every mismatch note of the restoration the reader may see (filtered here by reference when asked). */
export const useMismatchNotes = (restorationId: number) =>
  useQuery({
    queryKey: mismatchNotesQueryKey(restorationId),
    queryFn: () => api<MismatchNote[]>(`/restorations/${restorationId}/mismatch-notes`),
  });

function useInvalidate(restorationId: number) {
  const client = useQueryClient();
  return () => client.invalidateQueries({ queryKey: mismatchNotesQueryKey(restorationId) });
}

export function useCreateMismatchNote(restorationId: number) {
  const invalidate = useInvalidate(restorationId);
  return useMutation({
    mutationFn: (input: MismatchNoteInput) =>
      api<MismatchNote>(`/restorations/${restorationId}/mismatch-notes`, { method: 'POST', json: input }),
    onSettled: invalidate,
  });
}

export function useUpdateMismatchNote(restorationId: number) {
  const invalidate = useInvalidate(restorationId);
  return useMutation({
    mutationFn: ({ id, patch }: { id: number; patch: MismatchNotePatch }) =>
      api<MismatchNote>(`/mismatch-notes/${id}`, { method: 'PATCH', json: patch }),
    onSettled: invalidate,
  });
}

export function useDeleteMismatchNote(restorationId: number) {
  const invalidate = useInvalidate(restorationId);
  return useMutation({
    mutationFn: (id: number) => api<void>(`/mismatch-notes/${id}`, { method: 'DELETE' }),
    onSettled: invalidate,
  });
}
