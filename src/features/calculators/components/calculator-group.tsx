import { useId, type ReactNode } from 'react';

/** A heading and a grid of cards: one column on a phone, two from a tablet up (each card then lays its fields out in pairs). */
export function CalculatorGroup({ title, children }: { title: string; children: ReactNode }) {
  const id = useId();
  return (
    <section aria-labelledby={id} className="space-y-3">
      <h2 id={id} className="border-b border-rule pb-1 text-xl font-bold">
        {title}
      </h2>
      <div className="grid items-start gap-4 md:grid-cols-2">{children}</div>
    </section>
  );
}
