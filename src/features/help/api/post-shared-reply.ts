import { useMutation } from '@tanstack/react-query';
import { heldReplySchema, type HelpReplyInput } from '../../../../shared/schemas/help';
import { api } from '../../../lib/api-client';

/** Leaves a reply through the link; it waits for the technician's approval. */
export const postSharedReply = (token: string, reply: HelpReplyInput) =>
  api(`/shared/help/${encodeURIComponent(token)}/replies`, { method: 'POST', json: reply, schema: heldReplySchema });

export const usePostSharedReply = (token: string) =>
  useMutation({ mutationFn: (reply: HelpReplyInput) => postSharedReply(token, reply) });
