import { z } from 'zod';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { findingSchema } from '../../../../shared/schemas/findings';
import { apiGet } from '../../../lib/api-client';
import { findingKeys } from './keys';

export const getRestorationFindings = (restorationId: number) => apiGet(`/restorations/${restorationId}/findings`, z.array(findingSchema));

export const restorationFindingsQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: findingKeys.restoration(restorationId), queryFn: () => getRestorationFindings(restorationId) });

export const useRestorationFindings = (restorationId: number) => useQuery(restorationFindingsQueryOptions(restorationId));
