import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  estimateSchema,
  workshopSettingsSchema,
  type estimateDecisionInputSchema,
  type EstimateInput,
} from '../../../../shared/schemas/estimates';
import { api, apiGet } from '../../../lib/api-client';

/** Query keys follow the resource paths. */
export const moneyKeys = {
  estimates: (restorationId: number) => ['restorations', restorationId, 'estimates'] as const,
  history: (restorationId: number) => ['restorations', restorationId, 'events'] as const,
};

/** A restoration's estimates the reader may see, newest version first. */
export const getEstimates = (restorationId: number) =>
  apiGet(`/restorations/${restorationId}/estimates`, z.array(estimateSchema));

export const estimatesQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: moneyKeys.estimates(restorationId), queryFn: () => getEstimates(restorationId) });

export const useEstimates = (restorationId: number) => useQuery(estimatesQueryOptions(restorationId));

function useAfterWrite(restorationId: number) {
  const client = useQueryClient();
  return () =>
    Promise.all([
      client.invalidateQueries({ queryKey: moneyKeys.estimates(restorationId) }),
      client.invalidateQueries({ queryKey: moneyKeys.history(restorationId) }),
    ]);
}

/** Writes a new version (sent to the owner now, or kept as a draft). */
export function useCreateEstimate(restorationId: number) {
  const after = useAfterWrite(restorationId);
  return useMutation({
    mutationFn: (input: EstimateInput) =>
      api(`/restorations/${restorationId}/estimates`, { method: 'POST', json: input, schema: estimateSchema }),
    onSuccess: after,
  });
}

export function useSendEstimate(restorationId: number) {
  const after = useAfterWrite(restorationId);
  return useMutation({
    mutationFn: (estimateId: number) =>
      api(`/estimates/${estimateId}/send`, { method: 'POST', schema: estimateSchema }),
    onSuccess: after,
  });
}

/** The owner's answer to the version they read. */
export function useDecideEstimate(restorationId: number) {
  const after = useAfterWrite(restorationId);
  return useMutation({
    mutationFn: (input: z.input<typeof estimateDecisionInputSchema> & { estimateId: number }) =>
      api(`/estimates/${input.estimateId}/decision`, {
        method: 'POST',
        schema: estimateSchema,
        json: { decision: input.decision, name: input.name, version: input.version },
      }),
    onSuccess: after,
  });
}

/** The workshop's prices a new estimate will carry (technicians only). */
export const useMoneySettings = (restorationId: number, enabled: boolean) =>
  useQuery({
    queryKey: ['restorations', restorationId, 'money-settings'],
    queryFn: () => apiGet(`/restorations/${restorationId}/money-settings`, workshopSettingsSchema),
    enabled,
  });
