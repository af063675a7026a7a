import { useState } from 'react';
import { anodeDissipation, formatQuantity, rectifierLoad } from '../../../../shared/bench';
import type { RatingCheck } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { formatPercent } from '../../../lib/format';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { ResultLine, ResultList, ResultNote } from './result-line';
import { SafetyNote } from './safety-note';
import { TextInput } from './text-input';
import { VerdictMark } from './verdict-mark';

function CheckLine({ label, check, unit }: { label: string; check: RatingCheck; unit: 'W' | 'A' }) {
  return (
    <div className="space-y-1">
      <ResultList>
        <ResultLine label={label}>{formatQuantity(check.value, unit)}</ResultLine>
        <ResultLine label="Maximum">
          {check.rating === undefined ? 'not in Gridleak’s table' : formatQuantity(check.rating, unit)}
        </ResultLine>
        {check.fraction !== undefined && (
          <ResultLine label="Of the maximum">{formatPercent(check.fraction)}</ResultLine>
        )}
      </ResultList>
      {check.verdict !== 'unknown' && <VerdictMark verdict={check.verdict} />}
    </div>
  );
}

/** anodeDissipation and rectifierLoad: a valve's anode watts and a rectifier's DC current against the type's maximum. */
export function ValveRatingsCard() {
  const [valve, setValve] = useState('ECL86');
  const anodeVolts = useQuantity('200 V', 'V');
  const anodeAmps = useQuantity('38m', 'A');
  const dcAmps = useQuantity('', 'A');
  const name = valve.trim() === '' ? undefined : valve;
  const outcome = calculate([name], ([type]) => ({
    anode:
      anodeVolts.value !== undefined && anodeAmps.value !== undefined
        ? anodeDissipation({ valve: type, anodeVolts: anodeVolts.value, anodeAmps: anodeAmps.value })
        : undefined,
    rectifier: dcAmps.value !== undefined ? rectifierLoad({ valve: type, dcAmps: dcAmps.value }) : undefined,
  }));
  return (
    <CalculatorCard
      title="Valve ratings"
      description="Anode dissipation, or a rectifier’s load current, against the type’s maximum."
      formula="P_a = V_a · I_a (anode to cathode volts × anode current); rectifier: DC load current against I_max"
      source="Makers’ published maxima as listed in Gridleak’s valve table (each type names its source)"
    >
      <TextInput label="Valve type" value={valve} onChange={setValve} placeholder="e.g. ECL86, EZ80, 6V6GT" capitals />
      <CardFields>
        <QuantityInput label="Anode volts (V)" field={anodeVolts} placeholder="e.g. 200 V" />
        <QuantityInput label="Anode current (A)" field={anodeAmps} placeholder="e.g. 38m" />
        <QuantityInput label="Rectifier DC current (A), optional" field={dcAmps} placeholder="e.g. 75m" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Type the valve, then its anode volts and current or its DC load."
        invalid={anyInvalid(anodeVolts, anodeAmps, dcAmps)}
      >
        {(r) => (
          <>
            {r.anode && <CheckLine label="Anode dissipation" check={r.anode} unit="W" />}
            {r.rectifier && <CheckLine label="Rectifier load" check={r.rectifier} unit="A" />}
            {!r.anode && !r.rectifier && (
              <ResultNote>Enter the anode volts and current, or the rectifier’s DC current.</ResultNote>
            )}
            {(r.anode?.source ?? r.rectifier?.source) && (
              <ResultNote>{`Maximum from: ${r.anode?.source ?? r.rectifier?.source ?? ''}.`}</ResultNote>
            )}
            <ResultNote>
              Measure the anode volts from anode to cathode, not to chassis, when the valve has cathode bias.
            </ResultNote>
          </>
        )}
      </ResultPanel>
      <SafetyNote>
        <p>Anode and rectifier readings are taken on a powered set at HT: clip the leads on with the set off.</p>
      </SafetyNote>
    </CalculatorCard>
  );
}
