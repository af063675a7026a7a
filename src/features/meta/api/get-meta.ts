import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Meta } from '../../../../shared/schemas/meta';
import { api } from '../../../lib/api-client';

export const getMeta = () => api<Meta>('/meta');

export const metaQueryOptions = () => queryOptions({ queryKey: ['meta'], queryFn: getMeta, staleTime: Infinity });

export const useMeta = () => useQuery(metaQueryOptions());
