import { dischargeTime, formatQuantity, storedEnergy, timeConstant } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';
import { SafetyNote } from './safety-note';

/** storedEnergy and dischargeTime: what a charged filter capacitor holds, and how long a resistor takes to drain it. */
export function DischargeCard() {
  const capacitance = useQuantity('32µ', 'F');
  const charged = useQuantity('320 V', 'V');
  const resistor = useQuantity('22k', 'Ω');
  const safe = useQuantity('30 V', 'V');
  // Stored energy needs only C and V, so a refused discharge target must not hide it.
  const energy = calculate([capacitance.value, charged.value], ([farads, volts]) =>
    formatQuantity(storedEnergy(farads, volts), 'J'),
  );
  const discharge = calculate(
    [capacitance.value, charged.value, resistor.value, safe.value],
    ([farads, volts, ohms, target]) => ({
      tau: formatQuantity(timeConstant(ohms, farads), 's'),
      time: formatQuantity(dischargeTime(farads, ohms, volts, target), 's'),
      from: formatQuantity(volts, 'V'),
      to: formatQuantity(target, 'V'),
    }),
  );
  return (
    <CalculatorCard
      title="Stored energy and discharge time"
      description="What a charged filter capacitor holds, and how long a resistor takes to bring it down."
      formula="E = ½CV²; τ = RC; t = RC·ln(V₀ ÷ V)"
      source="Circuit physics: energy in a capacitor and exponential discharge through a resistor"
    >
      <CardFields>
        <QuantityInput label="Capacitance (F)" field={capacitance} placeholder="e.g. 32µ" />
        <QuantityInput label="Charged to (V)" field={charged} placeholder="e.g. 320 V" />
        <QuantityInput label="Discharge resistor (Ω)" field={resistor} placeholder="e.g. 22k" />
        <QuantityInput label="Down to (V)" field={safe} placeholder="e.g. 30 V" />
      </CardFields>
      <ResultPanel
        outcome={energy}
        waiting="Enter the capacitance and the voltage it is charged to."
        invalid={anyInvalid(capacitance, charged)}
      >
        {(joules) => (
          <>
            <MainResult label="Stored energy" value={joules} />
            {anyInvalid(resistor, safe) ? (
              <ResultNote>Correct the value marked above to see the discharge time.</ResultNote>
            ) : discharge.status === 'ready' ? (
              <ResultList>
                <ResultLine label={`From ${discharge.value.from} to ${discharge.value.to}`}>
                  {discharge.value.time}
                </ResultLine>
                <ResultLine label="Time constant τ">{discharge.value.tau}</ResultLine>
              </ResultList>
            ) : discharge.status === 'refused' ? (
              <ResultNote>
                <span className="font-semibold text-danger">Discharge time not worked out: </span>
                {discharge.message}
              </ResultNote>
            ) : (
              <ResultNote>Enter the resistor and the level to discharge to for the time it takes.</ResultNote>
            )}
          </>
        )}
      </ResultPanel>
      <SafetyNote>
        <p>
          Discharge through a resistor of adequate rating on insulated leads, never by shorting the terminals. Then
          verify with a meter that the voltage has gone before you touch anything. Never rely on bleeder resistors: they
          can fail open, and a capacitor can recover some charge after it has been discharged.
        </p>
      </SafetyNote>
    </CalculatorCard>
  );
}
