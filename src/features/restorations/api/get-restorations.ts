import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { restorationSchema, type Restoration, type Stage } from '../../../../shared/schemas/restorations';
import { apiGet } from '../../../lib/api-client';

export interface RestorationFilter {
  q?: string;
  stage?: Stage;
}

export function getRestorations(filter: RestorationFilter = {}): Promise<Restoration[]> {
  const params = new URLSearchParams();
  if (filter.q) params.set('q', filter.q);
  if (filter.stage) params.set('stage', filter.stage);
  const qs = params.toString();
  return apiGet(`/restorations${qs ? `?${qs}` : ''}`, z.array(restorationSchema));
}

export const restorationsQueryOptions = (filter: RestorationFilter = {}) =>
  // While a search is typed, the previous list stays on screen instead of flashing to a spinner.
  queryOptions({ queryKey: ['restorations', filter], queryFn: () => getRestorations(filter), placeholderData: keepPreviousData });

export const useRestorations = (filter: RestorationFilter = {}) => useQuery(restorationsQueryOptions(filter));
