import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { HelpReply } from '../../../../shared/schemas/help';
import { api } from '../../../lib/api-client';
import { invalidateHelp } from './keys';

/** Lets a held reply into the request's thread and onto the link. */
export const approveHelpReply = (replyId: number) =>
  api<HelpReply>(`/help-replies/${replyId}/approve`, { method: 'POST' });

export function useApproveHelpReply(restorationId: number, helpRequestId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: approveHelpReply,
    onSuccess: () => invalidateHelp(client, restorationId, helpRequestId),
  });
}
