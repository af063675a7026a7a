import { queryOptions, useQuery } from '@tanstack/react-query';
import { sessionSchema, type User } from '../../../../shared/schemas/auth';
import { apiGet } from '../../../lib/api-client';
import { ME_KEY } from '../../../lib/session-key';

export { ME_KEY };

/**
 * The signed-in person, or null when signed out. Asked of `/auth/session`, which answers 200 either way, so a
 * signed-out page logs no failed request.
 */
export async function getMe(): Promise<User | null> {
  return (await apiGet('/auth/session', sessionSchema)).user;
}

export const meQueryOptions = () => queryOptions({ queryKey: ME_KEY, queryFn: getMe, staleTime: 60_000 });

export const useMe = () => useQuery(meQueryOptions());
