import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  invoicePreviewSchema,
  invoiceSchema,
  type DepositInput,
  type voidInputSchema,
} from '../../../../shared/schemas/invoices';
import { api, apiGet } from '../../../lib/api-client';
import { moneyKeys } from './estimates';
import { personTimeZone } from '../../../lib/format';

export const invoiceKeys = {
  list: (restorationId: number) => ['restorations', restorationId, 'invoices'] as const,
  preview: (restorationId: number) => ['restorations', restorationId, 'invoices', 'preview'] as const,
};

/** Deposits, invoices and credit notes of a set, newest number first. */
export const useInvoices = (restorationId: number) =>
  useQuery({
    queryKey: invoiceKeys.list(restorationId),
    queryFn: () => apiGet(`/restorations/${restorationId}/invoices`, z.array(invoiceSchema)),
  });

/** The final invoice as it would be issued now (technicians only). */
export const useInvoicePreview = (restorationId: number, enabled: boolean) =>
  useQuery({
    queryKey: invoiceKeys.preview(restorationId),
    queryFn: () => apiGet(`/restorations/${restorationId}/invoices/preview`, invoicePreviewSchema),
    enabled,
  });

function useAfterIssue(restorationId: number) {
  const client = useQueryClient();
  return () =>
    Promise.all([
      client.invalidateQueries({ queryKey: invoiceKeys.list(restorationId) }),
      client.invalidateQueries({ queryKey: moneyKeys.history(restorationId) }),
    ]);
}

export function useRequestDeposit(restorationId: number) {
  const after = useAfterIssue(restorationId);
  return useMutation({
    mutationFn: (input: DepositInput) =>
      api(`/restorations/${restorationId}/deposits`, { method: 'POST', json: input, schema: invoiceSchema }),
    onSuccess: after,
  });
}

export function useIssueInvoice(restorationId: number) {
  const after = useAfterIssue(restorationId);
  return useMutation({
    mutationFn: () => api(`/restorations/${restorationId}/invoices`, { method: 'POST', schema: invoiceSchema }),
    onSuccess: after,
  });
}

export function useVoidInvoice(restorationId: number) {
  const after = useAfterIssue(restorationId);
  return useMutation({
    mutationFn: (input: z.input<typeof voidInputSchema> & { invoiceId: number }) =>
      api(`/invoices/${input.invoiceId}/void`, {
        method: 'POST',
        json: { reason: input.reason },
        schema: invoiceSchema,
      }),
    onSuccess: after,
  });
}

/** Where the PDF of an invoice (or its receipt) downloads, with the reader's time zone for its dates. */
export function documentUrl(invoiceId: number, kind: 'invoice' | 'receipt'): string {
  const zone = personTimeZone();
  return `/api/invoices/${invoiceId}/${kind}.pdf${zone ? `?timeZone=${encodeURIComponent(zone)}` : ''}`;
}
