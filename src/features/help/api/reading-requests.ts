import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  benchReadingRequestSchema,
  readingRequestSchema,
  type ReadingAnswerInput,
  type ReadingRequestInput,
} from '../../../../shared/schemas/reading-requests';
import { api, apiGet } from '../../../lib/api-client';
import { helpKeys } from './keys';

export const getReadingRequests = (restorationId: number) =>
  apiGet(`/restorations/${restorationId}/reading-requests`, z.array(readingRequestSchema));
export const readingRequestsQueryOptions = (restorationId: number) =>
  queryOptions({ queryKey: helpKeys.readingRequests(restorationId), queryFn: () => getReadingRequests(restorationId) });
export const useReadingRequests = (restorationId: number) => useQuery(readingRequestsQueryOptions(restorationId));

/** Open tasks and recent answers on every set where the person is a technician or mentor. */
export const getBenchReadingRequests = () => apiGet('/reading-requests', z.array(benchReadingRequestSchema));
export const useBenchReadingRequests = () =>
  useQuery({ queryKey: helpKeys.benchReadingRequests, queryFn: getBenchReadingRequests });

const refresh = (client: ReturnType<typeof useQueryClient>, restorationId: number) =>
  Promise.all([
    client.invalidateQueries({ queryKey: helpKeys.readingRequests(restorationId) }),
    client.invalidateQueries({ queryKey: helpKeys.benchReadingRequests }),
    client.invalidateQueries({ queryKey: ['restorations', restorationId] }),
  ]);

export const askForReading = (restorationId: number, input: ReadingRequestInput) =>
  api(`/restorations/${restorationId}/reading-requests`, { method: 'POST', json: input, schema: readingRequestSchema });

export function useAskForReading(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: ReadingRequestInput) => askForReading(restorationId, input),
    onSuccess: () => refresh(client, restorationId),
  });
}

export const answerReadingRequest = (readingRequestId: number, input: ReadingAnswerInput) =>
  api(`/reading-requests/${readingRequestId}/answer`, { method: 'POST', json: input, schema: readingRequestSchema });

export function useAnswerReadingRequest(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (v: { id: number; input: ReadingAnswerInput }) => answerReadingRequest(v.id, v.input),
    onSuccess: () => refresh(client, restorationId),
  });
}
