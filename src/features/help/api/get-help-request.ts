import { queryOptions, useQuery } from '@tanstack/react-query';
import { helpRequestSchema } from '../../../../shared/schemas/help';
import { apiGet } from '../../../lib/api-client';
import { helpKeys } from './keys';

/** One help request as the workshop sees it, with its choices, links and every reply. */
export const getHelpRequest = (helpRequestId: number) => apiGet(`/help-requests/${helpRequestId}`, helpRequestSchema);

export const helpRequestQueryOptions = (helpRequestId: number) =>
  queryOptions({ queryKey: helpKeys.one(helpRequestId), queryFn: () => getHelpRequest(helpRequestId) });

export const useHelpRequest = (helpRequestId: number) => useQuery(helpRequestQueryOptions(helpRequestId));
