import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import {
  labourLogSchema,
  type labourEntryInputSchema,
  type LabourLog,
  type labourTimerInputSchema,
} from '../../../../shared/schemas/labour';
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

/** What a time entry is for: a finding or a stage, with its note and whether it is billed. */
export type LabourTarget = z.output<typeof labourTimerInputSchema>;

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
  useLabourWrite(restorationId, (input: z.input<typeof labourEntryInputSchema>) =>
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
