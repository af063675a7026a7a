import type { QueryClient } from '@tanstack/react-query';

export const helpKeys = {
  list: (restorationId: number) => ['restorations', restorationId, 'help-requests'] as const,
  one: (helpRequestId: number) => ['help-requests', helpRequestId] as const,
  shared: (token: string) => ['shared', 'help', token] as const,
  checks: (restorationId: number) => ['restorations', restorationId, 'symptom-checks'] as const,
  readingRequests: (restorationId: number) => ['restorations', restorationId, 'reading-requests'] as const,
  benchReadingRequests: ['reading-requests'] as const,
};

/** After a write to a request: the request itself and its restoration's list are stale. */
export function invalidateHelp(client: QueryClient, restorationId: number, helpRequestId: number) {
  return Promise.all([
    client.invalidateQueries({ queryKey: helpKeys.list(restorationId) }),
    client.invalidateQueries({ queryKey: helpKeys.one(helpRequestId) }),
  ]);
}
