import { useEffect, useState } from 'react';
import type { Invoice } from '../../../../shared/schemas/invoices';
import type { Payment } from '../../../../shared/schemas/payments';

export type ReturnState = 'processing' | 'received' | 'failed' | 'cancelled' | 'slow';

/** How long the page asks every few seconds before it says the confirmation is taking a while. */
const PATIENCE_MS = 120_000;
/** How often the lists are asked again: every few seconds at first, then every half minute until the answer comes. */
export const POLL_MS = { eager: 2_500, patient: 30_000 };

/**
 * Back from the checkout page: the redirect proves nothing, so the page says "processing" until the payment
 * service's event has been recorded (the invoice is paid, or the payment from this checkout failed).
 */
export function returnState(
  outcome: string | null,
  invoice: Invoice | undefined,
  list: Payment[],
  session: string | null,
  waitedTooLong: boolean,
): ReturnState | null {
  if (outcome === 'cancelled') return 'cancelled';
  if (outcome !== 'processing') return null;
  const mine = session ? list.find((p) => p.checkoutSessionId === session) : undefined;
  if (mine?.status === 'succeeded' || (!session && invoice?.status === 'paid')) return 'received';
  if (mine?.status === 'failed') return 'failed';
  return waitedTooLong ? 'slow' : 'processing';
}

/**
 * How often to ask again: not at all unless the owner is back from the checkout page, and never again once the
 * payment is settled (received or failed), so a page left open does not poll for ever.
 */
export function pollingFor(waiting: boolean, settled: boolean, waitedTooLong: boolean): number | false {
  if (!waiting || settled) return false;
  return waitedTooLong ? POLL_MS.patient : POLL_MS.eager;
}

export const isSettled = (state: ReturnState | null) => state === 'received' || state === 'failed';

export function useWaitedTooLong(active: boolean) {
  const [tooLong, setTooLong] = useState(false);
  useEffect(() => {
    if (!active) return;
    const timer = setTimeout(() => setTooLong(true), PATIENCE_MS);
    return () => clearTimeout(timer);
  }, [active]);
  return tooLong;
}

const words: Record<ReturnState, { text: string; tone: string; alert?: boolean }> = {
  processing: {
    text: 'Payment processing: this page updates by itself once the payment service confirms it.',
    tone: 'border-glow bg-panel',
  },
  slow: {
    text: 'The payment is still being confirmed. Nothing more to do here: this page keeps checking every half minute.',
    tone: 'border-glow bg-panel',
  },
  received: { text: 'Payment received. Thank you.', tone: 'border-ok bg-panel' },
  failed: {
    text: 'The payment did not go through and nothing was taken. You can try again.',
    tone: 'border-danger bg-danger-soft',
    alert: true,
  },
  cancelled: { text: 'Payment cancelled: nothing was taken.', tone: 'border-rule bg-panel' },
};

export function PaymentReturnNote({ state }: { state: ReturnState }) {
  const w = words[state];
  return (
    <p
      role={w.alert ? 'alert' : 'status'}
      aria-live="polite"
      className={`rounded-lg border-l-4 px-4 py-3 font-semibold ${w.tone}`}
    >
      {w.text}
    </p>
  );
}
