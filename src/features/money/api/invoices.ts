import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { DepositInput, Invoice, InvoicePreview } from '../../../../shared/schemas/invoices';
import { api } from '../../../lib/api-client';
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
    queryFn: () => api<Invoice[]>(`/restorations/${restorationId}/invoices`),
  });

/** The final invoice as it would be issued now (technicians only). */
export const useInvoicePreview = (restorationId: number, enabled: boolean) =>
  useQuery({
    queryKey: invoiceKeys.preview(restorationId),
    queryFn: () => api<InvoicePreview>(`/restorations/${restorationId}/invoices/preview`),
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
      api<Invoice>(`/restorations/${restorationId}/deposits`, { method: 'POST', json: input }),
    onSuccess: after,
  });
}

export function useIssueInvoice(restorationId: number) {
  const after = useAfterIssue(restorationId);
  return useMutation({
    mutationFn: () => api<Invoice>(`/restorations/${restorationId}/invoices`, { method: 'POST' }),
    onSuccess: after,
  });
}

export function useVoidInvoice(restorationId: number) {
  const after = useAfterIssue(restorationId);
  return useMutation({
    mutationFn: (input: { invoiceId: number; reason: string }) =>
      api<Invoice>(`/invoices/${input.invoiceId}/void`, { method: 'POST', json: { reason: input.reason } }),
    onSuccess: after,
  });
}

/** Where the PDF of an invoice (or its receipt) downloads, with the reader's time zone for its dates. */
export function documentUrl(invoiceId: number, kind: 'invoice' | 'receipt'): string {
  const zone = personTimeZone();
  return `/api/invoices/${invoiceId}/${kind}.pdf${zone ? `?timeZone=${encodeURIComponent(zone)}` : ''}`;
}
