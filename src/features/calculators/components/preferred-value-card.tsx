import { useId, useState } from 'react';
import { formatQuantity } from '../../../../shared/bench';
import type { ESeries } from '../../../../shared/bench';
import { inputClass } from '../../../components/field';
import { useQuantity } from '../hooks/use-quantity';
import { formatPercent } from '../../../lib/format';
import { calculate } from '../lib/outcome';
import { E_SERIES, preferredNeighbours } from '../lib/preferred-neighbours';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList } from './result-line';

/** preferredValue: the nearest value one can buy in a series, and the values either side. */
export function PreferredValueCard() {
  const seriesId = useId();
  const [series, setSeries] = useState<ESeries>('E12');
  const field = useQuantity('5.3k');
  const outcome = calculate([field.value, field.unit], ([value, unit]) => {
    const { below, nearest, above } = preferredNeighbours(value, series);
    return {
      nearest: formatQuantity(nearest, unit),
      below: formatQuantity(below, unit),
      above: formatQuantity(above, unit),
      off: formatPercent(nearest / value - 1, true),
    };
  });
  return (
    <CalculatorCard
      title="Preferred value"
      description="The nearest standard value to a calculated one."
      formula="nearest by ratio: the series value with the smallest |log(value ÷ candidate)|, one decade × 10ⁿ"
      source="IEC 60063 preferred number series (E3 to E96)"
    >
      <CardFields>
        <QuantityInput label="Value" field={field} placeholder="e.g. 5.3k, 0.038µ" />
        <div className="space-y-1">
          <label htmlFor={seriesId} className="block font-semibold">
            Series
          </label>
          <select
            id={seriesId}
            value={series}
            onChange={(e) => setSeries(e.target.value as ESeries)}
            className={inputClass}
          >
            {E_SERIES.map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </select>
        </div>
      </CardFields>
      <ResultPanel outcome={outcome} waiting="Type a value, for example 5.3k." invalid={field.error !== undefined}>
        {(r) => (
          <>
            <MainResult label={`Nearest in ${series}`} value={r.nearest} />
            <ResultList>
              <ResultLine label="Off your value by">{r.off}</ResultLine>
              <ResultLine label="Next lower">{r.below}</ResultLine>
              <ResultLine label="Next higher">{r.above}</ResultLine>
            </ResultList>
          </>
        )}
      </ResultPanel>
    </CalculatorCard>
  );
}
