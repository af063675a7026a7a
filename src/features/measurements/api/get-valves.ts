import { queryOptions, useQuery } from '@tanstack/react-query';
import type { LineUp } from '../../../../shared/schemas/measurements';
import { api } from '../../../lib/api-client';
import { measurementKeys } from './keys';

/** The valve line-up (V1, V2, …) and whether it points to a live chassis. */
export const getValves = (restorationId: number) => api<LineUp>(`/restorations/${restorationId}/valves`);

export const valvesQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: measurementKeys.valves(restorationId), queryFn: () => getValves(restorationId) });

export const useValves = (restorationId: number) => useQuery(valvesQueryOptions(restorationId));
