import { useState } from 'react';
import { capacitorCode, formatQuantity } from '../../../../shared/bench';
import { formatNumber } from '../../../lib/format';
import { calculate } from '../lib/outcome';
import { CalculatorCard } from './calculator-card';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList } from './result-line';
import { TextInput } from './text-input';

/** capacitorCode: the three-digit number printed on small ceramic and film capacitors. */
export function CapacitorCodeCard() {
  const [code, setCode] = useState('473K');
  const outcome = calculate([code.trim() === '' ? undefined : code], ([text]) => {
    const farads = capacitorCode(text);
    return {
      value: formatQuantity(farads, 'F'),
      picofarads: `${formatNumber(farads * 1e12, 6)} pF`,
      microfarads: `${formatNumber(farads * 1e6, 6)} µF`,
    };
  });
  const error = outcome.status === 'refused' ? outcome.message : undefined;
  return (
    <CalculatorCard
      title="Capacitor code"
      description="The three digits on a ceramic or film capacitor."
      formula={
        'C = first two digits × 10^third (pF); third digit 8 → ×0.01, 9 → ×0.1; ' +
        'a letter after is the tolerance (J ±5 %, K ±10 %, M ±20 %)'
      }
      source="Three-digit capacitor code (EIA-style tables); tolerance letters per IEC 60062"
    >
      <TextInput
        label="Code on the part"
        value={code}
        onChange={setCode}
        placeholder="e.g. 104, 473K"
        error={error}
        capitals
      />
      <ResultPanel outcome={outcome} waiting="Type the code, for example 104." invalid={error !== undefined}>
        {(r) => (
          <>
            <MainResult label="Capacitance" value={r.value} />
            <ResultList>
              <ResultLine label="In picofarads">{r.picofarads}</ResultLine>
              <ResultLine label="In microfarads">{r.microfarads}</ResultLine>
            </ResultList>
          </>
        )}
      </ResultPanel>
    </CalculatorCard>
  );
}
