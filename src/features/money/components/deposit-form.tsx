import { useId, useState } from 'react';
import { parseMoney } from '../../../../shared/money/currency';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';
import { useRequestDeposit } from '../api/invoices';

/** Basis points from a typed per cent ("30", "12.5"); null unless 0.01–100 %. */
export const shareBasisPoints = (text: string) => {
  if (!/^\d+(\.\d{1,2})?$/.test(text.trim())) return null;
  const bp = Math.round(Number(text.trim()) * 100);
  return bp >= 1 && bp <= 10_000 ? bp : null;
};

/** A deposit request: a fixed amount in the workshop's currency, or a share of the approved estimate's high figure. */
export function DepositForm({
  restorationId,
  currency,
  onDone,
}: {
  restorationId: number;
  currency: string;
  onDone: () => void;
}) {
  const [mode, setMode] = useState<'amount' | 'share'>('share');
  const [text, setText] = useState('');
  const [error, setError] = useState('');
  const request = useRequestDeposit(restorationId);
  const inputId = useId();
  const submit = () => {
    if (mode === 'amount') {
      const m = parseMoney(text, currency);
      if (!m || m.amount < 1) return setError(`Type an amount in ${currency}, e.g. 50 or 49.50.`);
      request.mutate({ amount: m.amount }, { onSuccess: onDone });
    } else {
      const bp = shareBasisPoints(text);
      if (bp === null) return setError('Type a share between 0.01 and 100 per cent, e.g. 30.');
      request.mutate({ shareBasisPoints: bp }, { onSuccess: onDone });
    }
  };
  return (
    <form
      className="space-y-3 rounded-xl border border-rule bg-panel p-4"
      aria-label="Request a deposit"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <fieldset className="flex flex-wrap gap-4">
        <legend className="font-semibold">Ask for</legend>
        <label className="flex min-h-11 items-center gap-2">
          <input
            type="radio"
            name="deposit-mode"
            checked={mode === 'share'}
            onChange={() => {
              setMode('share');
              setError('');
            }}
          />{' '}
          A share of the approved estimate
        </label>
        <label className="flex min-h-11 items-center gap-2">
          <input
            type="radio"
            name="deposit-mode"
            checked={mode === 'amount'}
            onChange={() => {
              setMode('amount');
              setError('');
            }}
          />{' '}
          A fixed amount
        </label>
      </fieldset>
      <div className="max-w-xs space-y-1">
        <label htmlFor={inputId} className="block font-semibold">
          {mode === 'share' ? 'Per cent of the high figure' : `Amount (${currency})`}
        </label>
        <input
          id={inputId}
          inputMode="decimal"
          className={inputClass}
          value={text}
          placeholder={mode === 'share' ? '30' : '50.00'}
          aria-invalid={Boolean(error)}
          onChange={(e) => {
            setText(e.target.value);
            setError('');
          }}
        />
      </div>
      <p className="text-sm text-ink-soft">
        The request takes the next invoice number and is e-mailed to the owner with its PDF. It is deducted from the
        final invoice once paid.
      </p>
      {(error || request.isError) && (
        <p role="alert" className="font-semibold text-danger">
          {error || request.error?.message}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={request.isPending}>
          {request.isPending ? 'Issuing…' : 'Issue the deposit request'}
        </Button>
        <Button variant="quiet" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
