import { formatQuantity, rcCorner, timeConstant } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList } from './result-line';

/** rcCorner: the −3 dB point of a coupling capacitor and grid resistor, a tone control, a filter. */
export function RcCornerCard() {
  const resistance = useQuantity('220k', 'Ω');
  const capacitance = useQuantity('10n', 'F');
  const outcome = calculate([resistance.value, capacitance.value], ([ohms, farads]) => ({
    corner: formatQuantity(rcCorner(ohms, farads), 'Hz'),
    tau: formatQuantity(timeConstant(ohms, farads), 's'),
  }));
  return (
    <CalculatorCard
      title="RC corner frequency"
      description="The −3 dB point of a resistor and capacitor, such as a coupling capacitor into a grid resistor."
      formula="f = 1 ÷ (2πRC)"
      source="Circuit physics: first-order RC network"
    >
      <CardFields>
        <QuantityInput label="Resistance (Ω)" field={resistance} placeholder="e.g. 220k, 68k" />
        <QuantityInput label="Capacitance (F)" field={capacitance} placeholder="e.g. 10n, 6n8" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Enter the resistance and the capacitance."
        invalid={anyInvalid(resistance, capacitance)}
      >
        {(r) => (
          <>
            <MainResult label="Corner frequency" value={r.corner} />
            <ResultList>
              <ResultLine label="Time constant RC">{r.tau}</ResultLine>
            </ResultList>
          </>
        )}
      </ResultPanel>
    </CalculatorCard>
  );
}
