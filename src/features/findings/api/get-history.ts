import { z } from 'zod';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { findingChangeSchema } from '../../../../shared/schemas/findings';
import { apiGet } from '../../../lib/api-client';
import { findingKeys } from '../../../lib/queries/finding-keys';

export const getHistory = (id: number) => apiGet(`/findings/${id}/history`, z.array(findingChangeSchema));

export const historyQueryOptions = (id: number) =>
  queryOptions({ queryKey: findingKeys.history(id), queryFn: () => getHistory(id) });

export const useHistory = (id: number) => useQuery(historyQueryOptions(id));
