import type { QueryClient } from '@tanstack/react-query';
import type { User } from '../../../../shared/schemas/auth';
import { ME_KEY } from '../../../lib/session-key';

/**
 * When who is signed in changes, nothing cached for the previous person may show. Queries are removed
 * rather than the whole cache cleared: clear() would orphan the header's live subscription to "me". A query
 * whose answer is the same whoever asks says so with `meta: { anyPerson: true }` and is kept (an invitation's
 * preview: fetched again after the sign-up that accepted it, it would only meet 410 Gone).
 */
export function switchPerson(client: QueryClient, user: User | null): void {
  client.removeQueries({
    predicate: (q) => q.queryKey[0] !== 'auth' && q.queryKey[0] !== 'meta' && q.meta?.anyPerson !== true,
  });
  client.setQueryData(ME_KEY, user);
}
