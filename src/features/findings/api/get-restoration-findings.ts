import { queryOptions, useQuery } from '@tanstack/react-query';
import { findingSchema } from '../../../../shared/schemas/findings';
import { apiAllPages } from '../../../lib/api-client';
import { findingKeys } from './keys';

export const getRestorationFindings = (restorationId: number) => apiAllPages(`/restorations/${restorationId}/findings`, findingSchema);

export const restorationFindingsQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: findingKeys.restoration(restorationId), queryFn: () => getRestorationFindings(restorationId) });

export const useRestorationFindings = (restorationId: number) => useQuery(restorationFindingsQueryOptions(restorationId));
