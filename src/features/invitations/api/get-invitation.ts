import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InvitationPreview } from '../../../../shared/schemas/members';
import { api } from '../../../lib/api-client';

export const getInvitation = (token: string) => api<InvitationPreview>(`/invitations/${token}`);

export const invitationQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['invitations', token], queryFn: () => getInvitation(token) });

export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));
