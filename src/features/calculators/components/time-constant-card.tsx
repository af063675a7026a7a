import { formatQuantity, timeConstant } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';

/** timeConstant: how quickly an RC network charges or settles (AVC lines, decoupling, bleeders). */
export function TimeConstantCard() {
  const resistance = useQuantity('2M2', 'Ω');
  const capacitance = useQuantity('47n', 'F');
  const outcome = calculate([resistance.value, capacitance.value], ([ohms, farads]) => {
    const tau = timeConstant(ohms, farads);
    return { tau: formatQuantity(tau, 's'), settled: formatQuantity(5 * tau, 's') };
  });
  return (
    <CalculatorCard
      title="Time constant"
      description="How quickly a resistor and capacitor charge, discharge or settle."
      formula="τ = RC; after τ a step has gone 63 % of the way, after 5τ over 99 %"
      source="Circuit physics: v(t) = V·(1 − e^(−t/RC))"
    >
      <CardFields>
        <QuantityInput label="Resistance (Ω)" field={resistance} placeholder="e.g. 2M2" />
        <QuantityInput label="Capacitance (F)" field={capacitance} placeholder="e.g. 47n" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Enter the resistance and the capacitance."
        invalid={anyInvalid(resistance, capacitance)}
      >
        {(r) => (
          <>
            <MainResult label="Time constant τ" value={r.tau} />
            <ResultList>
              <ResultLine label="Settled (5τ)">{r.settled}</ResultLine>
            </ResultList>
            <ResultNote>After 5τ the voltage is within 1 % of where it is heading.</ResultNote>
          </>
        )}
      </ResultPanel>
    </CalculatorCard>
  );
}
