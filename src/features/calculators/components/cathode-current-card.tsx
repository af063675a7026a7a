import { cathodeCurrent, formatQuantity } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultNote } from './result-line';
import { SafetyNote } from './safety-note';

/** cathodeCurrent: a valve's current worked out from the voltage measured across its cathode resistor. */
export function CathodeCurrentCard() {
  const volts = useQuantity('8.2 V', 'V');
  const resistor = useQuantity('180', 'Ω');
  const outcome = calculate([volts.value, resistor.value], ([cathodeVolts, cathodeOhms]) =>
    formatQuantity(cathodeCurrent({ cathodeVolts, cathodeOhms }), 'A'),
  );
  return (
    <CalculatorCard
      title="Cathode current from a reading"
      description="A valve’s current from the voltage measured across its cathode resistor."
      formula="Ik = Vk ÷ Rk"
      source="Ohm’s law"
    >
      <CardFields>
        <QuantityInput label="Measured cathode volts (V)" field={volts} placeholder="e.g. 8.2 V" />
        <QuantityInput label="Cathode resistor (Ω)" field={resistor} placeholder="e.g. 180" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Enter the cathode volts and the resistor."
        invalid={anyInvalid(volts, resistor)}
      >
        {(current) => (
          <>
            <MainResult label="Cathode current Ik" value={current} />
            <ResultNote>
              For a pentode this is anode and screen current together; compare with Ia + Ig2 from the data.
            </ResultNote>
          </>
        )}
      </ResultPanel>
      <SafetyNote>
        <p>This reading is taken on a working set: clip the meter on with the set off and discharged, then power up.</p>
      </SafetyNote>
    </CalculatorCard>
  );
}
