import type { ReactNode } from 'react';

/** The answer a card exists for, large enough to read at arm's length. */
export function MainResult({ label, value }: { label: string; value: string }) {
  return (
    <p className="flex flex-wrap items-baseline justify-between gap-x-3">
      <span className="text-sm font-semibold text-ink-soft">{label}</span>
      <span className="font-mono text-2xl font-bold text-ink">{value}</span>
    </p>
  );
}

/** Secondary figures under the main result, as label and value pairs. */
export function ResultList({ children }: { children: ReactNode }) {
  return <dl className="space-y-1 text-sm">{children}</dl>;
}

export function ResultLine({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex flex-wrap items-baseline justify-between gap-x-3">
      <dt className="text-ink-soft">{label}</dt>
      <dd className="text-right font-mono">{children}</dd>
    </div>
  );
}

/** A sentence of explanation under a result: a rule's name, a library note, what to do next. */
export function ResultNote({ children }: { children: ReactNode }) {
  return <p className="text-sm text-ink-soft">{children}</p>;
}
