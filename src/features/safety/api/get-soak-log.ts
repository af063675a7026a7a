import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SoakLog } from '../../../../shared/schemas/safety';
import { api } from '../../../lib/api-client';
import { safetyKeys } from './keys';

/** The soak sessions, oldest first, the hours in total and the running one (its clock is the server's). */
export const getSoakLog = (restorationId: number) => api<SoakLog>(`/restorations/${restorationId}/soak-sessions`);

export const soakLogQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: safetyKeys.soak(restorationId), queryFn: () => getSoakLog(restorationId) });

export const useSoakLog = (restorationId: number) => useQuery(soakLogQueryOptions(restorationId));
