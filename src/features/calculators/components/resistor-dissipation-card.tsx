import { formatQuantity, resistorDissipation } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { suggestedRating } from '../lib/bench-advice';
import { formatPercent } from '../../../lib/format';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';
import { VerdictMark } from './verdict-mark';

/** resistorDissipation: what a resistor turns to heat, from two of volts, current and resistance, against its rating. */
export function ResistorDissipationCard() {
  const ohms = useQuantity('33k', 'Ω');
  const volts = useQuantity('120 V', 'V');
  const amps = useQuantity('', 'A');
  const rating = useQuantity('0.5 W', 'W');
  const known = [ohms.value, volts.value, amps.value].filter((v) => v !== undefined).length >= 2 ? true : undefined;
  const outcome = calculate([known], () => {
    const check = resistorDissipation({
      ...(ohms.value === undefined ? {} : { ohms: ohms.value }),
      ...(volts.value === undefined ? {} : { volts: volts.value }),
      ...(amps.value === undefined ? {} : { amps: amps.value }),
      ...(rating.value === undefined ? {} : { ratingWatts: rating.value }),
    });
    const suggested = suggestedRating(check.value);
    return {
      ...check,
      watts: formatQuantity(check.value, 'W'),
      suggested: suggested === undefined ? undefined : formatQuantity(suggested, 'W'),
    };
  });
  return (
    <CalculatorCard
      title="Resistor dissipation"
      description="What a resistor turns to heat, from any two of its volts, current and resistance."
      formula="P = V² ÷ R = I² · R = V · I"
      source="Joule’s law (any circuits textbook)"
    >
      <CardFields>
        <QuantityInput label="Resistance (Ω)" field={ohms} placeholder="e.g. 33k" />
        <QuantityInput label="Volts across it (V)" field={volts} placeholder="e.g. 120 V" />
        <QuantityInput label="Current through it (A)" field={amps} placeholder="e.g. 3.6m" />
        <QuantityInput label="Its rating (W), optional" field={rating} placeholder="e.g. 0.5 W" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Fill in any two of resistance, volts and current."
        invalid={anyInvalid(ohms, volts, amps, rating)}
      >
        {(r) => (
          <>
            <MainResult label="Dissipation" value={r.watts} />
            {r.verdict !== 'unknown' && <VerdictMark verdict={r.verdict} />}
            {r.fraction !== undefined && (
              <ResultList>
                <ResultLine label="Of its rating">{formatPercent(r.fraction)}</ResultLine>
              </ResultList>
            )}
            {r.suggested && (
              <ResultNote>{`A replacement rated at least twice that (a ${r.suggested} part) runs cool: common practice, not a published rule.`}</ResultNote>
            )}
          </>
        )}
      </ResultPanel>
    </CalculatorCard>
  );
}
