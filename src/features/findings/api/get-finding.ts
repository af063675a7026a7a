import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Finding } from '../../../../shared/schemas/findings';
import { api } from '../../../lib/api-client';
import { findingKeys } from './keys';

export const getFinding = (id: number) => api<Finding>(`/findings/${id}`);

export const findingQueryOptions = (id: number) => queryOptions({ queryKey: findingKeys.one(id), queryFn: () => getFinding(id) });

export const useFinding = (id: number | undefined) => useQuery({ ...findingQueryOptions(id ?? 0), enabled: Boolean(id) });
