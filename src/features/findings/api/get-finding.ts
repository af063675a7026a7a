import { queryOptions, useQuery } from '@tanstack/react-query';
import { findingSchema } from '../../../../shared/schemas/findings';
import { apiGet } from '../../../lib/api-client';
import { findingKeys } from '../../../lib/queries/finding-keys';

export const getFinding = (id: number) => apiGet(`/findings/${id}`, findingSchema);

export const findingQueryOptions = (id: number) => queryOptions({ queryKey: findingKeys.one(id), queryFn: () => getFinding(id) });

export const useFinding = (id: number | undefined) => useQuery({ ...findingQueryOptions(id ?? 0), enabled: Boolean(id) });
