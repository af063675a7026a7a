import { queryOptions, useQuery } from '@tanstack/react-query';
import { measurementSchema } from '../../../../shared/schemas/measurements';
import { apiAllPages } from '../../../lib/api-client';
import { measurementKeys } from './keys';

/** Every reading on a restoration the caller may see (owners get only the shared ones), oldest first. */
export const getMeasurements = (restorationId: number) =>
  apiAllPages(`/restorations/${restorationId}/measurements`, measurementSchema);

export const measurementsQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: measurementKeys.restoration(restorationId), queryFn: () => getMeasurements(restorationId) });

export const useMeasurements = (restorationId: number) => useQuery(measurementsQueryOptions(restorationId));
