import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role } from '../../../../shared/permissions';
import { z } from 'zod';
import { invitationSentSchema, memberSchema, type InvitationInput } from '../../../../shared/schemas/members';
import { api } from '../../../lib/api-client';

/** Every change to the people on a restoration refreshes its members and invitations. */
function usePeopleMutation<T>(restorationId: number, fn: (input: T) => Promise<unknown>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: () => client.invalidateQueries({ queryKey: ['restorations', restorationId] }),
  });
}

export const useChangeRole = (restorationId: number) =>
  usePeopleMutation(restorationId, ({ userId, role }: { userId: number; role: Role }) =>
    api(`/restorations/${restorationId}/members/${userId}`, {
      method: 'PATCH',
      json: { role },
      schema: z.array(memberSchema),
    }),
  );

export const useRemoveMember = (restorationId: number) =>
  usePeopleMutation(restorationId, (userId: number) =>
    api(`/restorations/${restorationId}/members/${userId}`, { method: 'DELETE', noBody: true }),
  );

export const useInvite = (restorationId: number) =>
  usePeopleMutation(restorationId, (input: InvitationInput) =>
    api(`/restorations/${restorationId}/invitations`, { method: 'POST', json: input, schema: invitationSentSchema }),
  );

export const useResendInvitation = (restorationId: number) =>
  usePeopleMutation(restorationId, (id: number) =>
    api(`/restorations/${restorationId}/invitations/${id}/resend`, { method: 'POST', noBody: true }),
  );

export const useRevokeInvitation = (restorationId: number) =>
  usePeopleMutation(restorationId, (id: number) =>
    api(`/restorations/${restorationId}/invitations/${id}`, { method: 'DELETE', noBody: true }),
  );
