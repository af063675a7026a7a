import { queryOptions, useQuery } from '@tanstack/react-query';
import { invitationPreviewSchema } from '../../../../shared/schemas/members';
import { apiGet } from '../../../lib/api-client';

export const getInvitation = (token: string) => apiGet(`/invitations/${token}`, invitationPreviewSchema);

export const invitationQueryOptions = (token: string) =>
  // The preview is the token's, whoever is signed in: kept when the person changes (see `switchPerson`).
  queryOptions({ queryKey: ['invitations', token], queryFn: () => getInvitation(token), meta: { anyPerson: true } });

export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));
