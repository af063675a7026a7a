import { useQuery } from '@tanstack/react-query';
import type { ReferenceSummary } from '../../../shared/schemas/sheets';
import { api } from '../api-client';

export const referencesQueryKey = (restorationId: number) => ['restorations', restorationId, 'references'] as const;

/** Every known reference with its counts. */
export const useReferences = (restorationId: number, enabled = true) =>
  useQuery({
    queryKey: referencesQueryKey(restorationId),
    queryFn: () => api<ReferenceSummary[]>(`/restorations/${restorationId}/references`),
    enabled,
  });
