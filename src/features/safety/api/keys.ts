import type { QueryClient } from '@tanstack/react-query';

export const safetyKeys = {
  tests: (restorationId: number) => ['restorations', restorationId, 'safety-tests'] as const,
  soak: (restorationId: number) => ['restorations', restorationId, 'soak-sessions'] as const,
};

/** After a safety write: the tests, the soak log, the history and findings (a soak fault opens one) are stale. */
export function invalidateSafety(client: QueryClient, restorationId: number) {
  return Promise.all([
    client.invalidateQueries({ queryKey: safetyKeys.tests(restorationId) }),
    client.invalidateQueries({ queryKey: safetyKeys.soak(restorationId) }),
    client.invalidateQueries({ queryKey: ['restorations', restorationId, 'events'] }),
    client.invalidateQueries({ queryKey: ['restorations', restorationId, 'findings'] }),
  ]);
}
