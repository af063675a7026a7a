import { queryOptions, useQuery } from '@tanstack/react-query';
import { findingSchema } from '../../../shared/schemas/findings';
import { apiAllPages } from '../api-client';
import { findingKeys } from './finding-keys';

export const getRestorationFindings = (restorationId: number) =>
  apiAllPages(`/restorations/${restorationId}/findings`, findingSchema);

export const restorationFindingsQueryOptions = (restorationId: number) =>
  queryOptions({
    queryKey: findingKeys.restoration(restorationId),
    queryFn: () => getRestorationFindings(restorationId),
  });

export const useRestorationFindings = (restorationId: number) =>
  useQuery(restorationFindingsQueryOptions(restorationId));
