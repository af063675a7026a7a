import { queryOptions, useQuery } from '@tanstack/react-query';
import { measurementSchema } from '../../../../shared/schemas/measurements';
import { apiAllPages } from '../../../lib/api-client';
import { measurementKeys } from './keys';

/** The readings tied to one finding (the same list endpoint, filtered by the server). */
export const getFindingMeasurements = (restorationId: number, findingId: number) =>
  apiAllPages(`/restorations/${restorationId}/measurements?findingId=${findingId}`, measurementSchema);

export const findingMeasurementsQueryOptions = (restorationId: number, findingId: number) =>
  queryOptions({
    queryKey: measurementKeys.finding(findingId),
    queryFn: () => getFindingMeasurements(restorationId, findingId),
  });

export const useFindingMeasurements = (restorationId: number, findingId: number) =>
  useQuery(findingMeasurementsQueryOptions(restorationId, findingId));
