import { queryOptions, useQuery } from '@tanstack/react-query';
import { restorationSchema } from '../../../../shared/schemas/restorations';
import { apiGet } from '../../../lib/api-client';

export const getRestoration = (id: number) => apiGet(`/restorations/${id}`, restorationSchema);

export const restorationQueryOptions = (id: number) =>
  queryOptions({ queryKey: ['restorations', id], queryFn: () => getRestoration(id) });

export const useRestoration = (id: number) => useQuery(restorationQueryOptions(id));
