import type { ReactNode } from 'react';
import type { Outcome } from '../lib/outcome';

/**
 * Where a card's answer appears, announced politely as it changes. While a field is empty it says
 * what it waits for; when a field cannot be read it points there; when the library refuses, its reason.
 */
export function ResultPanel<T>({
  outcome,
  waiting,
  invalid = false,
  children,
}: {
  outcome: Outcome<T>;
  waiting: string;
  invalid?: boolean;
  children: (value: T) => ReactNode;
}) {
  return (
    <div aria-live="polite" className="space-y-2 rounded-lg bg-sunken px-3 py-3">
      {invalid ? (
        <p className="text-sm text-ink-soft">Correct the value marked above to see the result.</p>
      ) : outcome.status === 'ready' ? (
        children(outcome.value)
      ) : outcome.status === 'refused' ? (
        <p className="text-sm">
          <span className="font-semibold text-danger">Not worked out: </span>
          {outcome.message}
        </p>
      ) : (
        <p className="text-sm text-ink-soft">{waiting}</p>
      )}
    </div>
  );
}
