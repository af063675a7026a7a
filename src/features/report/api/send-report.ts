import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { reportPreviewKey } from './get-report-preview';

export interface SentReport {
  /** The owners' addresses the report went to. */
  sentTo: string[];
  /** The record of this send. */
  sendId?: number;
  /** The warnings shown when it was sent, kept with the record. */
  warnings?: string[];
}

/** E-mails the report to every owner on the restoration; a 409 (no owner yet) carries a message to show. */
export const sendReport = (restorationId: number) =>
  api<SentReport>(`/restorations/${restorationId}/report/send`, { method: 'POST' });

export function useSendReport(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => sendReport(restorationId),
    onSuccess: () =>
      Promise.all([
        client.invalidateQueries({ queryKey: reportPreviewKey(restorationId) }),
        client.invalidateQueries({ queryKey: ['restorations', restorationId, 'events'] }),
      ]),
  });
}
