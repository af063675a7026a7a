import { useMutation, useQueryClient } from '@tanstack/react-query';
import { reportSentSchema } from '../../../../shared/schemas/safety';
import { api } from '../../../lib/api-client';
import { reportPreviewKey } from './get-report-preview';

/** E-mails the report to every owner on the restoration; a 409 (no owner yet) carries a message to show. */
export const sendReport = (restorationId: number) =>
  api(`/restorations/${restorationId}/report/send`, { method: 'POST', schema: reportSentSchema });

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
