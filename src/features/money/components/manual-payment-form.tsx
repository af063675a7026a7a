import { useState, type FormEvent } from 'react';
import { minorDigits } from '../../../../shared/money/currency';
import { invoiceKindLabels, type Invoice } from '../../../../shared/schemas/invoices';
import { Button } from '../../../components/button';
import { useRecordPayment } from '../api/payments';
import { calendarDay } from '../../../lib/format';

const today = () => calendarDay(new Date());
const field = 'mt-1 block w-full rounded-lg border border-rule bg-paper px-3 py-2';

/** A bank transfer or cash that arrived, recorded by a technician against an open deposit request or invoice. */
export function ManualPaymentForm({ restorationId, invoices }: { restorationId: number; invoices: Invoice[] }) {
  const record = useRecordPayment(restorationId);
  const [invoiceId, setInvoiceId] = useState(invoices[0]!.id);
  const [amount, setAmount] = useState('');
  const [method, setMethod] = useState<'transfer' | 'cash'>('transfer');
  const [receivedOn, setReceivedOn] = useState(today());
  const [problem, setProblem] = useState('');
  const invoice = invoices.find((i) => i.id === invoiceId) ?? invoices[0]!;
  const currency = invoice.due.currency;
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const minor = Math.round(Number(amount.replace(',', '.')) * 10 ** minorDigits(currency));
    if (!Number.isFinite(minor) || minor <= 0) return setProblem(`Enter the amount received, in ${currency}.`);
    setProblem('');
    record.mutate(
      { invoiceId: invoice.id, amount: { amount: minor, currency }, method, receivedOn },
      { onSuccess: () => setAmount('') },
    );
  };
  return (
    <form
      onSubmit={submit}
      className="space-y-3 rounded-xl border border-rule bg-panel p-4"
      aria-labelledby="manual-payment-title"
    >
      <h3 id="manual-payment-title" className="font-bold">
        Record a transfer or cash
      </h3>
      <div className="grid gap-3 sm:grid-cols-2">
        <label className="font-semibold">
          Against
          <select className={field} value={invoice.id} onChange={(e) => setInvoiceId(Number(e.target.value))}>
            {invoices.map((i) => (
              <option key={i.id} value={i.id}>
                {invoiceKindLabels[i.kind]} no. {i.number}
              </option>
            ))}
          </select>
        </label>
        <label className="font-semibold">
          How
          <select className={field} value={method} onChange={(e) => setMethod(e.target.value as 'transfer' | 'cash')}>
            <option value="transfer">Bank transfer</option>
            <option value="cash">Cash</option>
          </select>
        </label>
        <label className="font-semibold">
          Amount ({currency})
          <input
            className={`${field} font-mono`}
            inputMode="decimal"
            value={amount}
            onChange={(e) => setAmount(e.target.value)}
          />
        </label>
        <label className="font-semibold">
          Received on
          <input className={field} type="date" value={receivedOn} onChange={(e) => setReceivedOn(e.target.value)} />
        </label>
      </div>
      {(problem || record.error) && (
        <p role="alert" className="font-semibold text-danger">
          {problem || record.error?.message}
        </p>
      )}
      {record.isSuccess && <p role="status">Payment recorded.</p>}
      <Button type="submit" disabled={record.isPending}>
        {record.isPending ? 'Recording…' : 'Record payment'}
      </Button>
    </form>
  );
}
