import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { referenceSummarySchema } from '../../../shared/schemas/sheets';
import { apiGet } from '../api-client';

export const referencesQueryKey = (restorationId: number) => ['restorations', restorationId, 'references'] as const;

/** Every known reference with its counts. */
export const useReferences = (restorationId: number, enabled = true) =>
  useQuery({
    queryKey: referencesQueryKey(restorationId),
    queryFn: () => apiGet(`/restorations/${restorationId}/references`, z.array(referenceSummarySchema)),
    enabled,
  });
