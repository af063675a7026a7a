import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Money } from '../../../../shared/money/currency';
import { z } from 'zod';
import { invoiceSchema } from '../../../../shared/schemas/invoices';
import {
  checkoutSchema,
  paymentSchema,
  refundAnswerSchema,
  type ManualPaymentInput,
} from '../../../../shared/schemas/payments';
import { api, apiGet } from '../../../lib/api-client';

/** Query keys follow the resource paths. */
export const paymentKeys = {
  invoices: (restorationId: number) => ['restorations', restorationId, 'invoices'] as const,
  payments: (restorationId: number) => ['restorations', restorationId, 'payments'] as const,
  history: (restorationId: number) => ['restorations', restorationId, 'events'] as const,
};

/** How often the lists are asked again while a payment is being processed (ms), or `false` when not waiting. */
export type Polling = number | false;

export const invoicesQueryOptions = (restorationId: number, polling: Polling = false) =>
  queryOptions({
    queryKey: paymentKeys.invoices(restorationId),
    queryFn: () => apiGet(`/restorations/${restorationId}/invoices`, z.array(invoiceSchema)),
    refetchInterval: polling,
  });
export const useRestorationInvoices = (restorationId: number, polling: Polling = false) =>
  useQuery(invoicesQueryOptions(restorationId, polling));

export const paymentsQueryOptions = (restorationId: number, polling: Polling = false) =>
  queryOptions({
    queryKey: paymentKeys.payments(restorationId),
    queryFn: () => apiGet(`/restorations/${restorationId}/payments`, z.array(paymentSchema)),
    refetchInterval: polling,
  });
export const usePayments = (restorationId: number, polling: Polling = false) =>
  useQuery(paymentsQueryOptions(restorationId, polling));

/** Asks for a hosted checkout and goes there; the card is entered on the payment service's page, never here. */
export function useCheckout() {
  return useMutation({
    mutationFn: (invoiceId: number) =>
      api(`/invoices/${invoiceId}/checkout`, { method: 'POST', schema: checkoutSchema }),
    onSuccess: ({ url }) => window.location.assign(url),
  });
}

function useAfterWrite(restorationId: number) {
  const client = useQueryClient();
  return () =>
    Promise.all(Object.values(paymentKeys).map((key) => client.invalidateQueries({ queryKey: key(restorationId) })));
}

/** A transfer or cash received, recorded by a technician. */
export function useRecordPayment(restorationId: number) {
  const after = useAfterWrite(restorationId);
  return useMutation({
    mutationFn: ({ invoiceId, ...input }: ManualPaymentInput & { invoiceId: number }) =>
      api(`/invoices/${invoiceId}/payments`, { method: 'POST', json: input, schema: paymentSchema }),
    onSuccess: after,
  });
}

/** A refund of all of a payment (no amount) or part of it; a card refund shows once the payment service confirms it. */
export function useRefund(restorationId: number) {
  const after = useAfterWrite(restorationId);
  return useMutation({
    mutationFn: ({ paymentId, amount }: { paymentId: number; amount?: Money }) =>
      api(`/payments/${paymentId}/refund`, {
        method: 'POST',
        json: amount ? { amount } : {},
        schema: refundAnswerSchema,
      }),
    onSuccess: after,
  });
}
