import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FindingChange } from '../../../../shared/schemas/findings';
import { api } from '../../../lib/api-client';
import { findingKeys } from './keys';

export const getHistory = (id: number) => api<FindingChange[]>(`/findings/${id}/history`);

export const historyQueryOptions = (id: number) => queryOptions({ queryKey: findingKeys.history(id), queryFn: () => getHistory(id) });

export const useHistory = (id: number) => useQuery(historyQueryOptions(id));
