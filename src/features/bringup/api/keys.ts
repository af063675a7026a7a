import type { QueryClient } from '@tanstack/react-query';
import type { Bringup } from '../../../../shared/schemas/bringup';

/** Query keys follow the resource paths. */
export const bringupKeys = {
  restoration: (restorationId: number) => ['restorations', restorationId, 'bringup'] as const,
  /** A step adds readings, and every write adds to the history. */
  readings: (restorationId: number) => ['restorations', restorationId, 'measurements'] as const,
  history: (restorationId: number) => ['restorations', restorationId, 'events'] as const,
};

/** Every write answers the whole bring-up record: keep it, and refresh what the write touched elsewhere. */
export function afterWrite(client: QueryClient, restorationId: number, data: Bringup) {
  client.setQueryData(bringupKeys.restoration(restorationId), data);
  return Promise.all([
    client.invalidateQueries({ queryKey: bringupKeys.readings(restorationId) }),
    client.invalidateQueries({ queryKey: bringupKeys.history(restorationId) }),
    client.invalidateQueries({
      predicate: ({ queryKey }) => queryKey[0] === 'findings' && queryKey[2] === 'measurements',
    }),
  ]);
}
