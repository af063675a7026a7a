import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role } from '../../../../shared/permissions';
import { api } from '../../../lib/api-client';

export const acceptInvitation = (token: string) =>
  api<{ restorationId: number; role: Role }>(`/invitations/${token}/accept`, { method: 'POST' });

export function useAcceptInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: () => client.invalidateQueries({ queryKey: ['restorations'] }),
  });
}
