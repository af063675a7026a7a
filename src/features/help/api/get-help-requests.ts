import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { helpRequestSummarySchema } from '../../../../shared/schemas/help';
import { apiGet } from '../../../lib/api-client';
import { helpKeys } from './keys';

/** The restoration's help requests, newest first, with how many replies wait for approval. */
export const getHelpRequests = (restorationId: number) =>
  apiGet(`/restorations/${restorationId}/help-requests`, z.array(helpRequestSummarySchema));

export const helpRequestsQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: helpKeys.list(restorationId), queryFn: () => getHelpRequests(restorationId) });

export const useHelpRequests = (restorationId: number) => useQuery(helpRequestsQueryOptions(restorationId));
