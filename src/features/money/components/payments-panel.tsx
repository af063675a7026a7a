import { useEffect, useState } from 'react';
import { useSearchParams } from 'react-router';
import { can, type Role } from '../../../../shared/permissions';
import { invoiceKindLabels } from '../../../../shared/schemas/invoices';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { usePayments, useRestorationInvoices } from '../api/payments';
import { ManualPaymentForm } from './manual-payment-form';
import { moneyText } from './money-text';
import { PayButton } from './pay-button';
import { PaymentLines } from './payment-lines';
import { isSettled, PaymentReturnNote, pollingFor, returnState, useWaitedTooLong } from './payment-return';

/**
 * What is owed and what was paid on one set: open deposit requests and invoices with a Pay button, and the
 * payment lines. Back from the checkout page it says "processing" and asks again until the payment is confirmed
 * (every few seconds, then every half minute), and not after.
 */
export function PaymentsPanel({ restorationId, role }: { restorationId: number; role: Role }) {
  const [params] = useSearchParams();
  const outcome = params.get('payment');
  const returnedFor = Number(params.get('invoice')) || undefined;
  const waiting = outcome === 'processing';
  const tooLong = useWaitedTooLong(waiting);
  // Settled once this checkout's payment is recorded: from then on the lists are not asked again.
  const [settled, setSettled] = useState(false);
  const polling = pollingFor(waiting, settled, tooLong);
  const invoices = useRestorationInvoices(restorationId, polling);
  const payments = usePayments(restorationId, polling);
  const state =
    invoices.data && payments.data
      ? returnState(
          outcome,
          invoices.data.find((i) => i.id === returnedFor),
          payments.data,
          params.get('session'),
          tooLong,
        )
      : null;
  useEffect(() => {
    if (isSettled(state)) setSettled(true);
  }, [state]);
  if (invoices.isPending || payments.isPending) return <Loading label="Fetching what is owed and paid…" />;
  if (invoices.isError) return <ErrorState error={invoices.error} onRetry={() => invoices.refetch()} />;
  if (payments.isError) return <ErrorState error={payments.error} onRetry={() => payments.refetch()} />;
  const open = invoices.data.filter((i) => i.status === 'open' && i.left.amount > 0);
  const refunded = invoices.data.filter((i) => i.status === 'refunded');
  const paying = state === 'processing' || state === 'slow';
  return (
    <div className="space-y-4">
      {state && <PaymentReturnNote state={state} />}
      {open.length > 0 && (
        <ul className="space-y-3">
          {open.map((i) => (
            <li
              key={i.id}
              className="flex flex-wrap items-center justify-between gap-3 rounded-xl border border-rule bg-panel px-4 py-3"
            >
              <div>
                <p className="font-semibold">
                  {invoiceKindLabels[i.kind]} no. {i.reference}
                </p>
                <p className="text-ink-soft">
                  {moneyText(i.left)} to pay{i.paid.amount > 0 && ` (${moneyText(i.paid)} paid so far)`}
                </p>
              </div>
              {can(role, 'payments.checkout') && !(paying && i.id === returnedFor) && <PayButton invoice={i} />}
            </li>
          ))}
        </ul>
      )}
      {refunded.length > 0 && (
        <ul className="space-y-2">
          {refunded.map((i) => (
            <li key={i.id} className="rounded-xl border border-rule bg-sunken px-4 py-3">
              <p className="font-semibold">
                {invoiceKindLabels[i.kind]} no. {i.reference}: refunded
              </p>
              <p className="text-ink-soft">{moneyText(i.refunded)} went back; nothing is left to pay.</p>
            </li>
          ))}
        </ul>
      )}
      {payments.data.length > 0 ? (
        <PaymentLines restorationId={restorationId} role={role} payments={payments.data} />
      ) : (
        open.length === 0 && (
          <EmptyState title="Nothing to pay">
            {role === 'owner'
              ? 'Deposit requests and invoices from the workshop appear here.'
              : 'No deposit request or invoice is open.'}
          </EmptyState>
        )
      )}
      {can(role, 'payments.record') && open.length > 0 && (
        <ManualPaymentForm restorationId={restorationId} invoices={open} />
      )}
    </div>
  );
}
