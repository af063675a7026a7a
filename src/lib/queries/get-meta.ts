import { queryOptions, useQuery } from '@tanstack/react-query';
import { metaSchema } from '../../../shared/schemas/meta';
import { apiGet } from '../api-client';

export const getMeta = () => apiGet('/meta', metaSchema);

export const metaQueryOptions = () => queryOptions({ queryKey: ['meta'], queryFn: getMeta, staleTime: Infinity });

export const useMeta = () => useQuery(metaQueryOptions());
