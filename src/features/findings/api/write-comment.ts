import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRef } from 'react';
import type { z } from 'zod';
import { commentSchema, type commentInputSchema } from '../../../../shared/schemas/comments';
import { api, ApiError } from '../../../lib/api-client';
import { findingKeys } from '../../../lib/queries/finding-keys';

type CommentInput = z.output<typeof commentInputSchema>;

/** 128 random bits as hex; works on plain-HTTP addresses too, where crypto.randomUUID is missing. */
export const newIdempotencyKey = () =>
  Array.from(crypto.getRandomValues(new Uint8Array(16)), (b) => b.toString(16).padStart(2, '0')).join('');

/** Posts a comment; the same `key` on a retry makes the server store it once and answer as the first time. */
export const createComment = (findingId: number, input: CommentInput, key: string) =>
  api(`/findings/${findingId}/comments`, {
    method: 'POST',
    json: input,
    headers: { 'Idempotency-Key': key },
    schema: commentSchema,
  });
export const editComment = (id: number, body: string) =>
  api(`/comments/${id}`, { method: 'PATCH', json: { body }, schema: commentSchema });
export const deleteComment = (id: number) => api(`/comments/${id}`, { method: 'DELETE', noBody: true });

/**
 * Writing, editing and deleting comments in one finding's thread. A post keeps its idempotency key until it
 * succeeds: the automatic retry after a lost connection, and sending the same text again after an error, reuse
 * it, so a comment the server stored before the answer got lost is not stored twice.
 */
export function useThreadMutations(findingId: number) {
  const client = useQueryClient();
  const pending = useRef<{ text: string; key: string }>(undefined);
  const refresh = () => client.invalidateQueries({ queryKey: findingKeys.comments(findingId) });
  return {
    create: useMutation({
      mutationFn: (input: CommentInput) => {
        const text = JSON.stringify([input.body, input.internal]);
        if (pending.current?.text !== text) pending.current = { text, key: newIdempotencyKey() };
        return createComment(findingId, input, pending.current.key);
      },
      retry: (count, error) => error instanceof ApiError && error.status === 0 && count < 2,
      onSuccess: () => {
        pending.current = undefined;
        return refresh();
      },
    }),
    edit: useMutation({
      mutationFn: ({ id, body }: { id: number; body: string }) => editComment(id, body),
      onSuccess: refresh,
    }),
    remove: useMutation({ mutationFn: deleteComment, onSuccess: refresh }),
  };
}
