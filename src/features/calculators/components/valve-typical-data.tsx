import { formatQuantity } from '../../../../shared/bench';
import type { DataConfidence, QuantityUnit, TypicalOperation, ValveData } from '../../../../shared/bench';
import { formatNumber } from '../../../lib/format';
import { ResultLine, ResultList, ResultNote } from './result-line';

const ROWS: ReadonlyArray<readonly [keyof TypicalOperation, string, QuantityUnit | 'mA/V' | 'µ']> = [
  ['anodeVolts', 'Anode volts Va', 'V'],
  ['screenVolts', 'Screen volts Vg2', 'V'],
  ['gridVolts', 'Grid volts Vg1', 'V'],
  ['anodeAmps', 'Anode current Ia', 'A'],
  ['screenAmps', 'Screen current Ig2', 'A'],
  ['cathodeOhms', 'Cathode resistor Rk', 'Ω'],
  ['transconductanceSiemens', 'Mutual conductance gm', 'mA/V'],
  ['mu', 'Amplification factor', 'µ'],
  ['anodeOhms', 'Anode resistance ra', 'Ω'],
  ['loadOhms', 'Load', 'Ω'],
  ['outputWatts', 'Output', 'W'],
  ['maxAnodeWatts', 'Anode dissipation, max', 'W'],
  ['maxRmsVolts', 'AC per anode, max (rms)', 'V'],
  ['maxDcAmps', 'DC output current, max', 'A'],
];

// A glyph and words for how far the figures can be trusted, never colour alone.
const CONFIDENCE: Record<DataConfidence, string> = {
  published: '● published data',
  mixed: '◐ partly published, partly from memory',
  'from memory': '○ from memory: provisional, check the type’s data sheet',
};

function show(value: number, unit: QuantityUnit | 'mA/V' | 'µ'): string {
  if (unit === 'mA/V') return `${formatNumber(value * 1000)} mA/V`;
  if (unit === 'µ') return formatNumber(value);
  return formatQuantity(value, unit);
}

/** Typical operation of a listed valve, with how far it can be trusted and where it comes from. */
export function ValveTypicalData({ data }: { data: ValveData }) {
  const typical = data.typical ?? {};
  const rows = ROWS.flatMap(([key, label, unit]) => {
    const value = typical[key];
    return value === undefined ? [] : [{ key, label, text: show(value, unit) }];
  });
  return (
    <div className="space-y-1 border-t border-rule pt-2">
      <p className="text-sm font-semibold">Typical operation</p>
      {rows.length === 0 ? (
        <ResultNote>No operating point in Gridleak’s table for this type.</ResultNote>
      ) : (
        <ResultList>
          {rows.map((row) => (
            <ResultLine key={row.key} label={row.label}>
              {row.text}
            </ResultLine>
          ))}
        </ResultList>
      )}
      <ResultNote>
        <span className="font-semibold text-ink">{CONFIDENCE[data.confidence]}.</span> Source: {data.source}. Makers’
        typical values; real valves spread by up to about ±30 %.
      </ResultNote>
    </div>
  );
}
