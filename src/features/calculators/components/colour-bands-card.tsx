import { useId, useState } from 'react';
import { colourBands, formatQuantity } from '../../../../shared/bench';
import { inputClass } from '../../../components/field';
import { BAND_COUNTS, BAND_LAYOUTS, DEFAULT_BANDS, capitalise } from '../lib/band-colours';
import type { BandCount } from '../lib/band-colours';
import { formatPercent } from '../../../lib/format';
import { calculate } from '../lib/outcome';
import { BandSelect } from './band-select';
import { CalculatorCard, CardFields } from './calculator-card';
import { ResistorDrawing } from './resistor-drawing';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList } from './result-line';

/** colourBands: 3 to 6 bands picked from lists, read from the end away from the tolerance band. */
export function ColourBandsCard() {
  const countId = useId();
  const [count, setCount] = useState<BandCount>(4);
  // Each band count keeps its own choices, so switching back and forth loses nothing.
  const [bands, setBands] = useState<Record<BandCount, readonly string[]>>(DEFAULT_BANDS);
  const colours = bands[count];
  const layout = BAND_LAYOUTS[count];
  const choose = (index: number, colour: string) =>
    setBands((all) => ({ ...all, [count]: all[count].map((c, i) => (i === index ? colour : c)) }));
  const outcome = calculate([colours], ([list]) => {
    const reading = colourBands([...list]);
    return {
      value: formatQuantity(reading.ohms, 'Ω'),
      tolerance: formatPercent(reading.tolerance),
      lowest: formatQuantity(reading.ohms * (1 - reading.tolerance), 'Ω', 4),
      highest: formatQuantity(reading.ohms * (1 + reading.tolerance), 'Ω', 4),
      tempco: reading.tempcoPpm,
    };
  });
  return (
    <CalculatorCard
      title="Resistor colour bands"
      description="Start from the end away from the gold, silver or wider-spaced band."
      formula="R = digits × multiplier ± tolerance; 3 bands: two digits and a multiplier, ±20 %; 5 and 6 bands: three digits"
      source="IEC 60062 colour code"
    >
      <ResistorDrawing colours={colours} tolerance={count > 3} />
      <div className="space-y-1">
        <label htmlFor={countId} className="block font-semibold">
          Number of bands
        </label>
        <select
          id={countId}
          value={count}
          onChange={(e) => setCount(Number(e.target.value) as BandCount)}
          className={inputClass}
        >
          {BAND_COUNTS.map((n) => (
            <option key={n} value={n}>
              {n} bands
            </option>
          ))}
        </select>
      </div>
      <CardFields>
        {layout.map((role, index) => (
          <BandSelect
            key={`${count}-${index}`}
            band={index + 1}
            role={role}
            colour={colours[index] ?? ''}
            onChange={(c) => choose(index, c)}
          />
        ))}
      </CardFields>
      <ResultPanel outcome={outcome} waiting="Pick a colour for every band.">
        {(r) => (
          <>
            <MainResult label="Resistance" value={`${r.value} ± ${r.tolerance}`} />
            <ResultList>
              <ResultLine label="Range">{`${r.lowest} to ${r.highest}`}</ResultLine>
              {r.tempco !== undefined && <ResultLine label="Temperature coefficient">{`${r.tempco} ppm/K`}</ResultLine>}
              <ResultLine label="Bands">{colours.map(capitalise).join(', ')}</ResultLine>
            </ResultList>
          </>
        )}
      </ResultPanel>
    </CalculatorCard>
  );
}
