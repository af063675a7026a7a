import { queryOptions, useQuery } from '@tanstack/react-query';
import { sharedHelpSchema } from '../../../../shared/schemas/help';
import { ApiError, apiGet } from '../../../lib/api-client';
import { helpKeys } from './keys';

export type { SharedHelp } from '../../../../shared/schemas/help';

/** A help request through its link, with no account. */
export const getSharedHelp = (token: string) => apiGet(`/shared/help/${encodeURIComponent(token)}`, sharedHelpSchema);

export const sharedHelpQueryOptions = (token: string) =>
  queryOptions({
    queryKey: helpKeys.shared(token),
    queryFn: () => getSharedHelp(token),
    // A link that is gone stays gone: no retries on 404.
    retry: (count, error) => !(error instanceof ApiError && error.status === 404) && count < 2,
  });

export const useSharedHelp = (token: string) => useQuery(sharedHelpQueryOptions(token));
