import { queryOptions, useQuery } from '@tanstack/react-query';
import { safetyStatusSchema } from '../../../../shared/schemas/safety';
import { apiGet } from '../../../lib/api-client';
import { safetyKeys } from './keys';

/** Every final safety test (newest first), the override if any, and whether the set may go to Returned. */
export const getSafetyTests = (restorationId: number) =>
  apiGet(`/restorations/${restorationId}/safety-tests`, safetyStatusSchema);

export const safetyTestsQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: safetyKeys.tests(restorationId), queryFn: () => getSafetyTests(restorationId) });

export const useSafetyTests = (restorationId: number) => useQuery(safetyTestsQueryOptions(restorationId));
