import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Restoration } from '../../../../shared/schemas/restorations';
import { api } from '../../../lib/api-client';

export const getRestoration = (id: number) => api<Restoration>(`/restorations/${id}`);

export const restorationQueryOptions = (id: number) =>
  queryOptions({ queryKey: ['restorations', id], queryFn: () => getRestoration(id) });

export const useRestoration = (id: number) => useQuery(restorationQueryOptions(id));
