import { queryOptions, useQuery } from '@tanstack/react-query';
import { bringupSchema } from '../../../../shared/schemas/bringup';
import { apiGet } from '../../../lib/api-client';
import { bringupKeys } from './keys';

/** The intake checklist, the pre-power checklist with its sign-off, and the power-up log (owners get theirs without bench notes). */
export const getBringup = (restorationId: number) => apiGet(`/restorations/${restorationId}/bringup`, bringupSchema);

export const bringupQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: bringupKeys.restoration(restorationId), queryFn: () => getBringup(restorationId) });

export const useBringup = (restorationId: number) => useQuery(bringupQueryOptions(restorationId));
