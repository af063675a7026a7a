import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Invitation } from '../../../../shared/schemas/members';
import { api } from '../../../lib/api-client';

export const getInvitations = (restorationId: number) => api<Invitation[]>(`/restorations/${restorationId}/invitations`);

export const invitationsQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: ['restorations', restorationId, 'invitations'], queryFn: () => getInvitations(restorationId) });

export const useInvitations = (restorationId: number, enabled: boolean) => useQuery({ ...invitationsQueryOptions(restorationId), enabled });
