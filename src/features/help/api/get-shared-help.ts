import { queryOptions, useQuery } from '@tanstack/react-query';
import type { HelpContent } from '../../../../shared/schemas/help';
import { ApiError, api } from '../../../lib/api-client';
import { helpKeys } from './keys';

export type SharedHelp = HelpContent & { expiresAt: string };

/** A help request through its link, with no account. */
export const getSharedHelp = (token: string) => api<SharedHelp>(`/shared/help/${encodeURIComponent(token)}`);

export const sharedHelpQueryOptions = (token: string) =>
  queryOptions({
    queryKey: helpKeys.shared(token),
    queryFn: () => getSharedHelp(token),
    // A link that is gone stays gone: no retries on 404.
    retry: (count, error) => !(error instanceof ApiError && error.status === 404) && count < 2,
  });

export const useSharedHelp = (token: string) => useQuery(sharedHelpQueryOptions(token));
