import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invitationAcceptedSchema } from '../../../../shared/schemas/members';
import { api } from '../../../lib/api-client';

export const acceptInvitation = (token: string) =>
  api(`/invitations/${token}/accept`, { method: 'POST', schema: invitationAcceptedSchema });

export function useAcceptInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: () => client.invalidateQueries({ queryKey: ['restorations'] }),
  });
}
