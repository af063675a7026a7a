import { queryOptions, useQuery } from '@tanstack/react-query';
import { memberSchema } from '../../../../shared/schemas/members';
import { apiAllPages } from '../../../lib/api-client';

export const getMembers = (restorationId: number) =>
  apiAllPages(`/restorations/${restorationId}/members`, memberSchema);

export const membersQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: ['restorations', restorationId, 'members'], queryFn: () => getMembers(restorationId) });

export const useMembers = (restorationId: number) => useQuery(membersQueryOptions(restorationId));
