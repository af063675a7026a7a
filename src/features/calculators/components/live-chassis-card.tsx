import { useState } from 'react';
import { liveChassisLikely } from '../../../../shared/bench';
import { lineUpItems } from '../lib/bench-advice';
import { calculate } from '../lib/outcome';
import { CalculatorCard } from './calculator-card';
import { ResultPanel } from './result-panel';
import { ResultNote } from './result-line';
import { SafetyNote } from './safety-note';
import { TextInput } from './text-input';

/** liveChassisLikely: whether a set's valve line-up points to series heaters across the mains. */
export function LiveChassisCard() {
  const [lineUp, setLineUp] = useState('UCH42 UAF42 UBC41 UL41 UY41');
  const items = lineUpItems(lineUp);
  const outcome = calculate([items.length > 0 ? items : undefined], ([list]) => liveChassisLikely(list));
  return (
    <CalculatorCard
      title="Live chassis check"
      description="Does the valve line-up point to an AC/DC set whose chassis is tied to the mains?"
      formula="series-heater letters (U, P, C…) or 25, 35, 50, 117 V American types → series string across the mains"
      source="Mullard–Philips heater letters; American type numbers begin with the heater voltage"
    >
      <TextInput
        label="Valve line-up"
        value={lineUp}
        onChange={setLineUp}
        placeholder="e.g. UCH42 UAF42 UBC41 UL41 UY41"
        hint="Every valve in the set, separated by spaces."
        capitals
      />
      <ResultPanel outcome={outcome} waiting="Type the set’s valves, for example UCH42 UAF42 UBC41 UL41 UY41.">
        {(r) =>
          r.likely ? (
            <div className="space-y-1 rounded-md border-2 border-danger bg-danger-soft px-3 py-2">
              <p className="text-lg font-bold text-danger">
                <span aria-hidden="true">⚠ </span>Live chassis likely
              </p>
              <ul className="list-disc space-y-0.5 pl-5 text-sm">
                {r.reasons.map((reason) => (
                  <li key={reason}>{reason}</li>
                ))}
              </ul>
              <p className="text-sm">
                Treat the chassis, and anything screwed to it, as connected to the mains. Work on it only through an isolation
                transformer.
              </p>
            </div>
          ) : (
            <>
              <p className="font-semibold">
                <span aria-hidden="true">○ </span>Nothing here points to series heaters.
              </p>
              <ResultNote>
                That does not make it safe: treat any set with a two-wire mains lead as live until you have checked.
              </ResultNote>
            </>
          )
        }
      </ResultPanel>
      <SafetyNote />
    </CalculatorCard>
  );
}
