import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export interface SentReport {
  /** The owners' addresses the report went to. */
  sentTo: string[];
}

/** E-mails the report to every owner on the restoration; a 409 (no owner yet) carries a message to show. */
export const sendReport = (restorationId: number) => api<SentReport>(`/restorations/${restorationId}/report/send`, { method: 'POST' });

export const useSendReport = (restorationId: number) => useMutation({ mutationFn: () => sendReport(restorationId) });
