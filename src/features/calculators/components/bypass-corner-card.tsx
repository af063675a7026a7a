import { bypassCorner, formatQuantity } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultNote } from './result-line';

/** bypassCorner: below what frequency a cathode bypass capacitor stops doing its job. */
export function BypassCornerCard() {
  const resistor = useQuantity('680', 'Ω');
  const capacitance = useQuantity('100µ', 'F');
  const outcome = calculate([resistor.value, capacitance.value], ([ohms, farads]) =>
    formatQuantity(bypassCorner(ohms, farads), 'Hz'),
  );
  return (
    <CalculatorCard
      title="Cathode bypass corner"
      description="Below this frequency the bypass capacitor lets the stage’s gain fall."
      formula="f ≥ 1 ÷ (2π·Rk·Ck)"
      source="Circuit physics; the valve’s own cathode resistance in parallel is a textbook refinement"
    >
      <CardFields>
        <QuantityInput label="Cathode resistor (Ω)" field={resistor} placeholder="e.g. 680, 2k2" />
        <QuantityInput label="Bypass capacitor (F)" field={capacitance} placeholder="e.g. 100µ" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Enter the cathode resistor and the capacitor."
        invalid={anyInvalid(resistor, capacitance)}
      >
        {(corner) => (
          <>
            <MainResult label="Corner, at least" value={corner} />
            <ResultNote>
              A lower bound: the valve’s own cathode resistance sits in parallel with Rk, so the true corner is higher.
            </ResultNote>
          </>
        )}
      </ResultPanel>
    </CalculatorCard>
  );
}
