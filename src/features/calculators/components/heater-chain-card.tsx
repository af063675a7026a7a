import { useState } from 'react';
import { formatQuantity, heaterChain } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { lineUpItems, suggestedRating } from '../lib/bench-advice';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';
import { SafetyNote } from './safety-note';
import { TextInput } from './text-input';

/** heaterChain: a series heater string's total, its current, the dropper for the rest of the mains, and a dial lamp's shunt. */
export function HeaterChainCard() {
  const [lineUp, setLineUp] = useState('UCH81 UF89 UABC80 UL84 UY85');
  const mains = useQuantity('230 V', 'V');
  const lampVolts = useQuantity('', 'V');
  const lampAmps = useQuantity('', 'A');
  const items = lineUpItems(lineUp);
  const outcome = calculate([items.length > 0 ? items : undefined, mains.value], ([valves, mainsVolts]) => {
    const lamp =
      lampVolts.value !== undefined && lampAmps.value !== undefined
        ? { volts: lampVolts.value, amps: lampAmps.value }
        : undefined;
    const chain = heaterChain({ valves, mainsVolts, ...(lamp ? { dialLamp: lamp } : {}) });
    const rating = suggestedRating(chain.dropperWatts);
    return {
      ...chain,
      total: formatQuantity(chain.volts, 'V', 4),
      current: formatQuantity(chain.amps, 'A'),
      dropper: chain.dropperOhms > 0 ? formatQuantity(chain.dropperOhms, 'Ω') : 'none needed',
      watts: formatQuantity(chain.dropperWatts, 'W'),
      rating: rating === undefined ? undefined : formatQuantity(rating, 'W'),
      shunt: chain.lampShuntOhms === undefined ? undefined : formatQuantity(chain.lampShuntOhms, 'Ω'),
    };
  });
  return (
    <CalculatorCard
      title="Series heater string"
      description="An AC/DC set’s heaters in one string: their total, the current, and the dropper for the rest of the mains."
      formula="ΣV_heater; R_dropper = (V_mains − ΣV_heater) ÷ I; P = (V_mains − ΣV_heater) · I; lamp shunt = V_lamp ÷ (I − I_lamp)"
      source="Ohm’s law; heater ratings from valve data handbooks (marked from memory where not checked)"
    >
      <TextInput
        label="Valves in the string"
        value={lineUp}
        onChange={setLineUp}
        placeholder="e.g. UCH81 UF89 UABC80 UL84 UY85"
        hint="European or American names, separated by spaces."
        capitals
      />
      <CardFields>
        <QuantityInput label="Mains (V)" field={mains} placeholder="e.g. 230 V" />
        <QuantityInput label="Dial lamp volts (V), optional" field={lampVolts} placeholder="e.g. 7 V" />
        <QuantityInput label="Dial lamp current (A), optional" field={lampAmps} placeholder="e.g. 50m" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Type the valves in the heater string and the mains."
        invalid={anyInvalid(mains, lampVolts, lampAmps)}
      >
        {(r) => (
          <>
            <MainResult label="Dropper" value={r.dropper} />
            {r.mixedCurrents && (
              <p className="text-sm font-semibold text-danger">
                <span aria-hidden="true">✕ </span>Valves made for different heater currents are mixed: in one string
                some heaters run hot and others cold. This is an error.
              </p>
            )}
            <ResultList>
              <ResultLine label="Heaters in the string">{r.total}</ResultLine>
              <ResultLine label="String current">{r.current}</ResultLine>
              <ResultLine label="Dropper dissipates">{r.watts}</ResultLine>
              {r.shunt && <ResultLine label="Dial lamp shunt">{r.shunt}</ResultLine>}
            </ResultList>
            {r.rating && (
              <ResultNote>{`Choose a dropper rated at least twice its dissipation (a ${r.rating} part): common practice, not a published rule.`}</ResultNote>
            )}
            {r.unknown.length > 0 && (
              <ResultNote>{`Not counted, check their heater data by hand: ${r.unknown.join(', ')}.`}</ResultNote>
            )}
          </>
        )}
      </ResultPanel>
      <SafetyNote>
        <p>
          A series-heater set has one side of the mains on its chassis, and its dropper runs hot enough to burn. Work on
          it only through an isolation transformer.
        </p>
      </SafetyNote>
    </CalculatorCard>
  );
}
