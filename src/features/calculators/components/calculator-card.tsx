import { useId, type ReactNode } from 'react';

/** One calculator: its inputs and result, with the formula and its source written under it. */
export function CalculatorCard({
  title,
  description,
  formula,
  source,
  children,
}: {
  title: string;
  description?: string;
  formula: ReactNode;
  source: string;
  children: ReactNode;
}) {
  const id = useId();
  return (
    <section
      aria-labelledby={id}
      className="@container flex flex-col rounded-xl border border-rule bg-panel p-4 shadow-sm"
    >
      <h3 id={id} className="text-lg font-bold">
        {title}
      </h3>
      {description && <p className="text-sm text-ink-soft">{description}</p>}
      <div className="mt-3 flex-1 space-y-3">{children}</div>
      <dl className="mt-4 grid grid-cols-[auto_1fr] gap-x-2 gap-y-1 border-t border-rule pt-3 text-xs text-ink-soft">
        <dt className="font-semibold">Formula</dt>
        <dd className="font-mono">{formula}</dd>
        <dt className="font-semibold">Source</dt>
        <dd>{source}</dd>
      </dl>
    </section>
  );
}

/** The inputs of a card: one column in a narrow card, two where the card is wide enough. */
export function CardFields({ children }: { children: ReactNode }) {
  return <div className="grid gap-3 @sm:grid-cols-2">{children}</div>;
}
