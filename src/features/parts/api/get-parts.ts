import { queryOptions, useQuery } from '@tanstack/react-query';
import { partSchema } from '../../../../shared/schemas/parts';
import { apiAllPages } from '../../../lib/api-client';
import { partKeys } from './keys';

/** The restoration's parts ledger; owners get it without costs, sources and notes. */
export const getParts = (restorationId: number) => apiAllPages(`/restorations/${restorationId}/parts`, partSchema);

export const partsQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: partKeys.restoration(restorationId), queryFn: () => getParts(restorationId) });

export const useParts = (restorationId: number) => useQuery(partsQueryOptions(restorationId));
