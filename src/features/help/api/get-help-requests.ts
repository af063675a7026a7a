import { queryOptions, useQuery } from '@tanstack/react-query';
import type { HelpRequestSummary } from '../../../../shared/schemas/help';
import { api } from '../../../lib/api-client';
import { helpKeys } from './keys';

/** The restoration's help requests, newest first, with how many replies wait for approval. */
export const getHelpRequests = (restorationId: number) =>
  api<HelpRequestSummary[]>(`/restorations/${restorationId}/help-requests`);

export const helpRequestsQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: helpKeys.list(restorationId), queryFn: () => getHelpRequests(restorationId) });

export const useHelpRequests = (restorationId: number) => useQuery(helpRequestsQueryOptions(restorationId));
