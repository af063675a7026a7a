import { queryOptions, useQuery } from '@tanstack/react-query';
import type { User } from '../../../../shared/schemas/auth';
import { api, ApiError } from '../../../lib/api-client';
import { ME_KEY } from '../../../lib/session-key';

export { ME_KEY };

/** The signed-in person, or null when signed out (a 401 here is an answer, not an error). */
export async function getMe(): Promise<User | null> {
  try {
    return await api<User>('/auth/me');
  } catch (err) {
    if (err instanceof ApiError && err.status === 401) return null;
    throw err;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: ME_KEY, queryFn: getMe, staleTime: 60_000 });

export const useMe = () => useQuery(meQueryOptions());
