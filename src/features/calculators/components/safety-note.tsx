import type { ReactNode } from 'react';

/**
 * The usual cautions, shown wherever a calculator touches mains or HT. `children` adds what is
 * particular to that card (how to discharge, what the lamp does not do) before the general words.
 */
export function SafetyNote({ children }: { children?: ReactNode }) {
  return (
    <div role="note" className="space-y-1 rounded-lg border-l-4 border-glow bg-glow-soft px-3 py-2 text-sm text-ink">
      <p className="font-semibold text-glow-strong">
        <span aria-hidden="true">⚠ </span>Lethal voltages
      </p>
      {children}
      <p>
        Valve sets carry lethal voltages (HT 200–300 V DC; AC/DC sets may have a live chassis). Discharge filter
        capacitors and verify with a meter; work through an isolation transformer; keep one hand away; use mains-rated
        X/Y safety capacitors where the mains connects. Results are aids, not certification: follow local electrical
        codes and licensed practice.
      </p>
    </div>
  );
}
