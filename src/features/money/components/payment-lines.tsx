import { can, type Role } from '../../../../shared/permissions';
import { invoiceKindLabels } from '../../../../shared/schemas/invoices';
import { paymentMethodLabels, type Payment } from '../../../../shared/schemas/payments';
import { useState } from 'react';
import { Button } from '../../../components/button';
import { moneyText } from './money-text';
import { RefundForm } from './refund-form';
import { formatMediumDate } from '../../../lib/format';

const statusWords: Record<Payment['status'], string> = {
  pending: 'processing',
  succeeded: 'received',
  failed: 'did not go through',
};
const dayText = (p: Payment) => formatMediumDate(p.receivedOn ? `${p.receivedOn}T12:00:00Z` : p.createdAt);

function describe(p: Payment) {
  if (p.kind === 'refund')
    return `Refund${p.method === 'card' ? ' to the card' : ` (${paymentMethodLabels[p.method].toLowerCase()})`}${p.status === 'succeeded' ? '' : `, ${statusWords[p.status]}`}`;
  return `${paymentMethodLabels[p.method]} payment ${statusWords[p.status]}`;
}

/** Money received and refunded on a set, oldest first; technicians may refund what is left of a payment. */
export function PaymentLines({
  restorationId,
  role,
  payments,
}: {
  restorationId: number;
  role: Role;
  payments: Payment[];
}) {
  const [refunding, setRefunding] = useState<number | null>(null);
  const canRefund = can(role, 'payments.record');
  return (
    <div className="space-y-2">
      <ul className="divide-y divide-rule rounded-xl border border-rule bg-panel">
        {payments.map((p) => (
          <li key={p.id} className="flex flex-wrap items-center justify-between gap-3 px-4 py-3">
            <div>
              <p className="font-semibold">{describe(p)}</p>
              <p className="text-sm text-ink-soft">
                {dayText(p)} · {p.kind === 'refund' ? 'against' : 'for'}{' '}
                {invoiceKindLabels[p.invoiceKind].toLowerCase()} no. {p.invoiceNumber}
                {p.kind === 'payment' && p.refunded.amount > 0 && ` · ${moneyText(p.refunded)} refunded`}
              </p>
              {p.refundDue.amount > 0 && (
                <p className="text-sm font-semibold text-danger">
                  {moneyText(p.refundDue)} of it was not due (the invoice was void or already paid when it arrived): to
                  be refunded.
                </p>
              )}
            </div>
            <div className="flex items-center gap-3">
              <span className={`font-mono ${p.status === 'failed' ? 'text-ink-soft line-through' : ''}`}>
                {p.kind === 'refund' ? '−' : ''}
                {moneyText(p.amount)}
              </span>
              {canRefund &&
                p.kind === 'payment' &&
                p.status === 'succeeded' &&
                p.refunded.amount < p.amount.amount &&
                refunding !== p.id && (
                  <Button
                    variant="quiet"
                    onClick={() => setRefunding(p.id)}
                    aria-label={`Refund the ${paymentMethodLabels[p.method].toLowerCase()} payment of ${moneyText(p.amount)}`}
                  >
                    Refund…
                  </Button>
                )}
            </div>
            {refunding === p.id && (
              <RefundForm restorationId={restorationId} payment={p} onDone={() => setRefunding(null)} />
            )}
          </li>
        ))}
      </ul>
    </div>
  );
}
