import type { QueryClient } from '@tanstack/react-query';

/** Query keys follow the resource paths, so a change can refresh exactly what it touched. */
export const measurementKeys = {
  restoration: (restorationId: number) => ['restorations', restorationId, 'measurements'] as const,
  finding: (findingId: number) => ['findings', findingId, 'measurements'] as const,
  valves: (restorationId: number) => ['restorations', restorationId, 'valves'] as const,
  /** The restoration itself: its liveChassis flag changes when the line-up does. */
  restorationItself: (restorationId: number) => ['restorations', restorationId] as const,
};

/**
 * A reading changed: refresh the restoration's list and every finding's list, since a reading can move
 * from one finding to another (or to none) and the old finding must drop it too.
 */
export function invalidateReadings(client: QueryClient, restorationId: number) {
  return Promise.all([
    client.invalidateQueries({ queryKey: measurementKeys.restoration(restorationId) }),
    client.invalidateQueries({
      predicate: ({ queryKey }) => queryKey[0] === 'findings' && queryKey[2] === 'measurements',
    }),
  ]);
}
