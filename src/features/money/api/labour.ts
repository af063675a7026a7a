import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { labourLogSchema, type LabourLog } from '../../../../shared/schemas/labour';
import type { Stage } from '../../../../shared/schemas/restorations';
import { api, apiGet } from '../../../lib/api-client';
import { invoiceKeys } from './invoices';
import { moneyKeys } from './estimates';

export const labourKey = (restorationId: number) => ['restorations', restorationId, 'labour'] as const;

/** The set's time entries, the reader's running timer (on any set) and this week's totals per technician. */
export const useLabour = (restorationId: number) =>
  useQuery({
    queryKey: labourKey(restorationId),
    queryFn: () => apiGet(`/restorations/${restorationId}/labour`, labourLogSchema),
  });

export interface LabourTarget {
  findingId: number | null;
  stage: Stage | null;
  note: string;
  billable: boolean;
}

function useLabourWrite<T>(restorationId: number, request: (input: T) => Promise<LabourLog>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: request,
    onSuccess: (log) => {
      client.setQueryData(labourKey(restorationId), log);
      return Promise.all([
        client.invalidateQueries({ queryKey: invoiceKeys.preview(restorationId) }),
        client.invalidateQueries({ queryKey: moneyKeys.history(restorationId) }),
      ]);
    },
  });
}

export const useAddLabour = (restorationId: number) =>
  useLabourWrite(restorationId, (input: LabourTarget & { minutes: number; workedAt?: string }) =>
    api(`/restorations/${restorationId}/labour`, { method: 'POST', json: input, schema: labourLogSchema }),
  );

export const useStartTimer = (restorationId: number) =>
  useLabourWrite(restorationId, (input: LabourTarget) =>
    api(`/restorations/${restorationId}/labour/timer`, { method: 'POST', json: input, schema: labourLogSchema }),
  );

export const useStopTimer = (restorationId: number) =>
  useLabourWrite(restorationId, () =>
    api(`/restorations/${restorationId}/labour/timer/stop`, { method: 'POST', schema: labourLogSchema }),
  );
