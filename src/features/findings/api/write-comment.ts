import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Comment } from '../../../../shared/schemas/findings';
import { api } from '../../../lib/api-client';
import { findingKeys } from './keys';

export const createComment = (findingId: number, input: { body: string; internal: boolean }) =>
  api<Comment>(`/findings/${findingId}/comments`, { method: 'POST', json: input });
export const editComment = (id: number, body: string) => api<Comment>(`/comments/${id}`, { method: 'PATCH', json: { body } });
export const deleteComment = (id: number) => api<void>(`/comments/${id}`, { method: 'DELETE' });

/** Writing, editing and deleting comments in one finding's thread. */
export function useThreadMutations(findingId: number) {
  const client = useQueryClient();
  const refresh = () => client.invalidateQueries({ queryKey: findingKeys.comments(findingId) });
  return {
    create: useMutation({ mutationFn: (input: { body: string; internal: boolean }) => createComment(findingId, input), onSuccess: refresh }),
    edit: useMutation({ mutationFn: ({ id, body }: { id: number; body: string }) => editComment(id, body), onSuccess: refresh }),
    remove: useMutation({ mutationFn: deleteComment, onSuccess: refresh }),
  };
}
