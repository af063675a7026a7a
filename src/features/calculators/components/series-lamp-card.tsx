import { formatQuantity, seriesLampLimitDetail } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';
import { SafetyNote } from './safety-note';

/** seriesLampLimitDetail: the most current a series ("dim-bulb") lamp lets through on a first power-up. */
export function SeriesLampCard() {
  const watts = useQuantity('40 W', 'W');
  const lampVolts = useQuantity('230 V', 'V');
  const mains = useQuantity('230 V', 'V');
  const outcome = calculate([watts.value, lampVolts.value, mains.value], ([lampWatts, lampVolts, mainsVolts]) => {
    const limit = seriesLampLimitDetail({ lampWatts, lampVolts, mainsVolts });
    return {
      amps: formatQuantity(limit.maxAmps, 'A'),
      hot: formatQuantity(limit.hotOhms, 'Ω'),
      cold: formatQuantity(limit.coldOhms, 'Ω'),
      note: limit.note,
    };
  });
  return (
    <CalculatorCard
      title="Series lamp limit"
      description="The most current a lamp in series lets through when a set is first powered."
      formula="R_hot = V_lamp² ÷ P; I_max = V_mains ÷ R_hot; R_cold ≈ R_hot ÷ 15"
      source="Circuit physics; tungsten cold resistance about 1/15 of hot (incandescent-lamp reference)"
    >
      <CardFields>
        <QuantityInput label="Lamp power (W)" field={watts} placeholder="e.g. 40 W" />
        <QuantityInput label="Lamp voltage (V)" field={lampVolts} placeholder="e.g. 230 V" />
        <QuantityInput label="Mains (V)" field={mains} placeholder="e.g. 230 V" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Fill in the lamp and the mains."
        invalid={anyInvalid(watts, lampVolts, mains)}
      >
        {(r) => (
          <>
            <MainResult label="Current at most" value={r.amps} />
            <ResultList>
              <ResultLine label="Lamp hot">{r.hot}</ResultLine>
              <ResultLine label="Lamp cold, about">{r.cold}</ResultLine>
            </ResultList>
            <ResultNote>{r.note}</ResultNote>
          </>
        )}
      </ResultPanel>
      <SafetyNote>
        <p>
          A brief flash that settles to a dim glow is usual; a lamp that stays fully bright points to a fault, so switch
          off (common practice). The lamp limits current; it does not isolate: an AC/DC chassis is still live.
        </p>
      </SafetyNote>
    </CalculatorCard>
  );
}
