import { formatQuantity, leakageLimitDetail } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { formatWait } from '../lib/format-wait';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';
import { SafetyNote } from './safety-note';

/** leakageLimitDetail: the most current a healthy electrolytic may pass at its rated voltage, and the rule behind it. */
export function LeakageCard() {
  const capacitance = useQuantity('16µ', 'F');
  const rated = useQuantity('350 V', 'V');
  const outcome = calculate([capacitance.value, rated.value], ([farads, volts]) => {
    const detail = leakageLimitDetail(farads, volts);
    return { ...detail, limit: formatQuantity(detail.amps, 'A'), wait: formatWait(detail.measureAfterSeconds) };
  });
  return (
    <CalculatorCard
      title="Leakage limit"
      description="The most current a healthy electrolytic may pass at its rated voltage."
      formula={
        '≤100 V: 0.01·C·V or 3 µA; >100 V: 0.03·C·V + 15 µA (C·V ≤ 1000) or 0.02·C·V + 25 µA; ' +
        'C in µF, V in V, result in µA'
      }
      source="Rule stated in a general-purpose radial aluminium electrolytic series datasheet"
    >
      <CardFields>
        <QuantityInput label="Capacitance (F)" field={capacitance} placeholder="e.g. 16µ, 8 MF" />
        <QuantityInput label="Rated voltage (V)" field={rated} placeholder="e.g. 350 WVDC" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Enter the capacitance and the rated voltage."
        invalid={anyInvalid(capacitance, rated)}
      >
        {(r) => (
          <>
            <MainResult label="Leakage at most" value={r.limit} />
            <ResultList>
              <ResultLine label="Read after">{`${r.wait} at rated voltage`}</ResultLine>
            </ResultList>
            <ResultNote>Rule: {r.rule}.</ResultNote>
            <ResultNote>{r.note}</ResultNote>
          </>
        )}
      </ResultPanel>
      <SafetyNote>
        <p>
          This test puts the full rated voltage on the capacitor: raise it slowly from a current-limited supply through
          a series resistor, and discharge the capacitor through a resistor afterwards.
        </p>
      </SafetyNote>
    </CalculatorCard>
  );
}
