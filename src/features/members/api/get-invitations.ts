import { z } from 'zod';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { invitationSchema } from '../../../../shared/schemas/members';
import { apiGet } from '../../../lib/api-client';

export const getInvitations = (restorationId: number) =>
  apiGet(`/restorations/${restorationId}/invitations`, z.array(invitationSchema));

export const invitationsQueryOptions = (restorationId: number) =>
  queryOptions({
    queryKey: ['restorations', restorationId, 'invitations'],
    queryFn: () => getInvitations(restorationId),
  });

export const useInvitations = (restorationId: number, enabled: boolean) =>
  useQuery({ ...invitationsQueryOptions(restorationId), enabled });
