import { cathodeBias, formatQuantity } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { suggestedRating } from '../lib/bench-advice';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';

/** cathodeBias: the bias a cathode resistor gives at a given anode (and screen) current, and what it dissipates. */
export function CathodeBiasCard() {
  const resistor = useQuantity('180', 'Ω');
  const anode = useQuantity('40m', 'A');
  const screen = useQuantity('4.5m', 'A');
  const outcome = calculate([resistor.value, anode.value], ([cathodeOhms, anodeAmps]) => {
    const bias = cathodeBias({ cathodeOhms, anodeAmps, screenAmps: screen.value ?? 0 });
    const rating = suggestedRating(bias.resistorWatts);
    return {
      bias: formatQuantity(bias.biasVolts, 'V'),
      grid: formatQuantity(bias.gridVolts, 'V'),
      current: formatQuantity(bias.cathodeAmps, 'A'),
      watts: formatQuantity(bias.resistorWatts, 'W'),
      twice: formatQuantity(2 * bias.resistorWatts, 'W'),
      rating: rating === undefined ? undefined : formatQuantity(rating, 'W'),
    };
  });
  return (
    <CalculatorCard
      title="Cathode bias"
      description="The bias a cathode resistor sets, and the power it must take."
      formula="Ik = Ia + Ig2; Vk = Ik·Rk; P = Ik²·Rk"
      source="Ohm’s law; the screen current returns through the cathode (valve data-sheet practice)"
    >
      <CardFields>
        <QuantityInput label="Cathode resistor (Ω)" field={resistor} placeholder="e.g. 180, 2k2" />
        <QuantityInput label="Anode current (A)" field={anode} placeholder="e.g. 40m" />
        <QuantityInput label="Screen current (A), optional" field={screen} placeholder="0 for a triode" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Enter the cathode resistor and the anode current."
        invalid={anyInvalid(resistor, anode, screen)}
      >
        {(r) => (
          <>
            <MainResult label="Cathode volts Vk" value={r.bias} />
            <ResultList>
              <ResultLine label="Grid to cathode, as data sheets write it">{r.grid}</ResultLine>
              <ResultLine label="Cathode current Ik">{r.current}</ResultLine>
              <ResultLine label="Resistor dissipation">{r.watts}</ResultLine>
            </ResultList>
            <ResultNote>
              {`Choose a resistor rated at least twice that, ${r.twice}`}
              {r.rating === undefined ? '' : ` (a ${r.rating} part)`}: common practice, not a published rule.
            </ResultNote>
          </>
        )}
      </ResultPanel>
    </CalculatorCard>
  );
}
