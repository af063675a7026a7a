import { useState } from 'react';
import { liveChassisLikely } from '../../../../shared/bench';
import { lineUpItems } from '../lib/bench-advice';
import { calculate } from '../lib/outcome';
import { CalculatorCard } from './calculator-card';
import { ResultPanel } from './result-panel';
import { ResultNote } from './result-line';
import { SafetyNote } from './safety-note';
import { TextInput } from './text-input';
import { Caution, CautionLead } from '../../../components/caution';

/** liveChassisLikely: whether a set's valve line-up points to series heaters across the mains. */
export function LiveChassisCard() {
  const [lineUp, setLineUp] = useState('UCH81 UF89 UABC80 UL84 UY85');
  const items = lineUpItems(lineUp);
  const outcome = calculate([items.length > 0 ? items : undefined], ([list]) => liveChassisLikely(list));
  return (
    <CalculatorCard
      title="Live chassis check"
      description="Does the valve line-up point to an AC/DC set whose chassis is tied to the mains?"
      formula="heaters of 18 V and more, or a 100/150/300 mA string adding up past half the mains → series string across the mains"
      source="European valve type code heater letters and American type numbers (heater volts first), per numbering-systems articles; heater ratings from valve data handbooks"
    >
      <TextInput
        label="Valve line-up"
        value={lineUp}
        onChange={setLineUp}
        placeholder="e.g. UCH81 UF89 UABC80 UL84 UY85"
        hint="Every valve in the set, separated by spaces."
        capitals
      />
      <ResultPanel outcome={outcome} waiting="Type the set’s valves, for example UCH81 UF89 UABC80 UL84 UY85.">
        {(r) =>
          r.likely ? (
            <Caution look="box" className="space-y-1">
              <p>
                <CautionLead className="text-lg">Live chassis likely</CautionLead>
              </p>
              <ul className="list-disc space-y-0.5 pl-5 text-sm">
                {r.reasons.map((reason) => (
                  <li key={reason}>{reason}</li>
                ))}
              </ul>
              {r.unknown.length > 0 && (
                <p className="text-sm">{`Not recognised, check their heater data by hand: ${r.unknown.join(', ')}.`}</p>
              )}
              <p className="text-sm">
                Treat the chassis, and anything screwed to it, as connected to the mains. Work on it only through an
                isolation transformer.
              </p>
            </Caution>
          ) : (
            <>
              <p className="font-semibold">
                <span aria-hidden="true">○ </span>Nothing here points to series heaters.
              </p>
              {r.unknown.length > 0 && (
                <ResultNote>{`Not recognised, check their heater data by hand: ${r.unknown.join(', ')}.`}</ResultNote>
              )}
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
