import { queryOptions, useQuery } from '@tanstack/react-query';
import { lineUpResultSchema } from '../../../../shared/schemas/measurements';
import { apiGet } from '../../../lib/api-client';
import { measurementKeys } from './keys';

/** The valve line-up (V1, V2, …) and whether it points to a live chassis. */
export const getValves = (restorationId: number) => apiGet(`/restorations/${restorationId}/valves`, lineUpResultSchema);

export const valvesQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: measurementKeys.valves(restorationId), queryFn: () => getValves(restorationId) });

export const useValves = (restorationId: number) => useQuery(valvesQueryOptions(restorationId));
