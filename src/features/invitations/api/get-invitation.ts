import { queryOptions, useQuery } from '@tanstack/react-query';
import { invitationPreviewSchema } from '../../../../shared/schemas/members';
import { apiGet } from '../../../lib/api-client';

export const getInvitation = (token: string) => apiGet(`/invitations/${token}`, invitationPreviewSchema);

export const invitationQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['invitations', token], queryFn: () => getInvitation(token) });

export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));
