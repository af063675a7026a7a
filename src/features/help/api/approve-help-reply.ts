import { useMutation, useQueryClient } from '@tanstack/react-query';
import { helpReplySchema } from '../../../../shared/schemas/help';
import { api } from '../../../lib/api-client';
import { invalidateHelp } from './keys';

/** Lets a held reply into the request's thread and onto the link. */
export const approveHelpReply = (replyId: number) =>
  api(`/help-replies/${replyId}/approve`, { method: 'POST', schema: helpReplySchema });

export function useApproveHelpReply(restorationId: number, helpRequestId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: approveHelpReply,
    onSuccess: () => invalidateHelp(client, restorationId, helpRequestId),
  });
}
