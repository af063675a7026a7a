import { formatQuantity, tapScaled } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { formatPercent } from '../../../lib/format';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';
import { SafetyNote } from './safety-note';

/** tapScaled: what a transformer winding gives when the mains differs from the primary tap it is set to. */
export function TapScalingCard() {
  const rated = useQuantity('6.3 V', 'V');
  const tap = useQuantity('210 V', 'V');
  const mains = useQuantity('235 V', 'V');
  const outcome = calculate([rated.value, tap.value, mains.value], ([ratedVolts, tapVolts, mainsVolts]) => {
    const volts = tapScaled({ ratedVolts, tapVolts, mainsVolts });
    return { volts: formatQuantity(volts, 'V'), off: formatPercent(volts / ratedVolts - 1, true) };
  });
  return (
    <CalculatorCard
      title="Mains tap scaling"
      description="What a winding gives when the mains differs from the tap the set is on."
      formula="V_out = V_rated × V_mains ÷ V_tap"
      source="Ideal transformer ratio; ignores regulation, so a real set reads a little different"
    >
      <CardFields>
        <QuantityInput label="Winding rated (V)" field={rated} placeholder="e.g. 6.3 V" />
        <QuantityInput label="Primary tap (V)" field={tap} placeholder="e.g. 210 V" />
        <QuantityInput label="Mains on the bench (V)" field={mains} placeholder="e.g. 235 V" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Fill in the winding, the tap and the mains."
        invalid={anyInvalid(rated, tap, mains)}
      >
        {(r) => (
          <>
            <MainResult label="The winding gives about" value={r.volts} />
            <ResultList>
              <ResultLine label="Against its rating">{r.off}</ResultLine>
            </ResultList>
            <ResultNote>
              Compare with the heater or HT rating in the valve data before the set runs for long.
            </ResultNote>
          </>
        )}
      </ResultPanel>
      <SafetyNote>
        <p>Change the mains tap only with the set unplugged, and check the setting before the first power-up.</p>
      </SafetyNote>
    </CalculatorCard>
  );
}
