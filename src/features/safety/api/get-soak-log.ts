import { queryOptions, useQuery } from '@tanstack/react-query';
import { soakLogSchema } from '../../../../shared/schemas/safety';
import { apiGet } from '../../../lib/api-client';
import { safetyKeys } from './keys';

/** The soak sessions, oldest first, the hours in total and the running one (its clock is the server's). */
export const getSoakLog = (restorationId: number) =>
  apiGet(`/restorations/${restorationId}/soak-sessions`, soakLogSchema);

export const soakLogQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: safetyKeys.soak(restorationId), queryFn: () => getSoakLog(restorationId) });

export const useSoakLog = (restorationId: number) => useQuery(soakLogQueryOptions(restorationId));
