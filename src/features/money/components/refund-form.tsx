import { useState, type FormEvent } from 'react';
import { minorDigits, parseMoney } from '../../../../shared/money/currency';
import { paymentMethodLabels, type Payment } from '../../../../shared/schemas/payments';
import { Button } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useRefund } from '../api/payments';
import { moneyText } from './money-text';

/** The amount as typed in the form: plain figures in the currency's major unit ("12.50"), no symbol. */
const plain = (minor: number, currency: string) => (minor / 10 ** minorDigits(currency)).toFixed(minorDigits(currency));

/**
 * A refund of all or part of one payment: the amount defaults to what is left of it (or to what was not due, when
 * the payment came in after its invoice was voided or paid). A card refund shows once the payment service confirms it.
 */
export function RefundForm({
  restorationId,
  payment: p,
  onDone,
}: {
  restorationId: number;
  payment: Payment;
  onDone: () => void;
}) {
  const refund = useRefund(restorationId);
  const currency = p.amount.currency;
  const left = p.amount.amount - p.refunded.amount;
  const [text, setText] = useState(plain(p.refundDue.amount > 0 ? p.refundDue.amount : left, currency));
  const [problem, setProblem] = useState('');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const amount = parseMoney(text, currency);
    if (!amount)
      return setProblem(
        `Enter an amount in ${currency}, such as ${plain(left, currency)}, with at most ${minorDigits(currency)} decimals.`,
      );
    if (amount.amount <= 0) return setProblem('Enter more than nothing.');
    if (amount.amount > left)
      return setProblem(`At most ${moneyText({ amount: left, currency })} of this payment can be refunded.`);
    setProblem('');
    refund.mutate(
      { paymentId: p.id, amount },
      {
        onSuccess: () => {
          if (p.method !== 'card') onDone();
        },
      },
    );
  };
  const what = `${paymentMethodLabels[p.method].toLowerCase()} payment of ${moneyText(p.amount)}`;
  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={`Refund the ${what}`}
      className="w-full space-y-2 rounded-lg bg-sunken p-3"
    >
      <Field
        label={`Amount to refund (${currency})`}
        hint={`Up to ${moneyText({ amount: left, currency })}; the rest of the payment unless you change it.`}
        error={problem || undefined}
      >
        {(a) => (
          <input
            {...a}
            className={inputClass}
            inputMode="decimal"
            value={text}
            onChange={(e) => setText(e.target.value)}
          />
        )}
      </Field>
      <p className="text-sm">
        {p.method === 'card'
          ? 'The payment service returns it to the card; the refund line appears once it confirms.'
          : 'Records that the money was handed back.'}
      </p>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="danger" disabled={refund.isPending || refund.isSuccess}>
          {refund.isPending ? 'Refunding…' : 'Refund'}
        </Button>
        <Button variant="quiet" onClick={onDone}>
          {refund.isSuccess ? 'Close' : 'Keep it'}
        </Button>
      </div>
      {refund.error && (
        <p role="alert" className="font-semibold text-danger">
          {refund.error.message}
        </p>
      )}
      {refund.isSuccess && <p role="status">Refund asked for; it shows here once confirmed.</p>}
    </form>
  );
}
