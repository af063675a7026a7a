import { useId, useState } from 'react';
import { inputClass } from '../../../components/field';
import { useQuantity } from '../hooks/use-quantity';
import type { ExpectedUnit } from '../lib/read-quantity';
import { calculate } from '../lib/outcome';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';

const KINDS: ReadonlyArray<{ unit: ExpectedUnit | ''; label: string; noun: string }> = [
  { unit: '', label: 'As written', noun: 'a plain number' },
  { unit: 'Ω', label: 'Resistance (Ω)', noun: 'resistance' },
  { unit: 'F', label: 'Capacitance (F)', noun: 'capacitance' },
  { unit: 'V', label: 'Voltage (V)', noun: 'voltage' },
  { unit: 'A', label: 'Current (A)', noun: 'current' },
  { unit: 'Hz', label: 'Frequency (Hz)', noun: 'frequency' },
  { unit: 'W', label: 'Power (W)', noun: 'power' },
  { unit: 's', label: 'Time (s)', noun: 'time' },
  { unit: 'J', label: 'Energy (J)', noun: 'energy' },
];

/** parseQuantity on its own: what a value written on a part or a diagram means. */
export function ValueReaderCard() {
  const kindId = useId();
  const [kind, setKind] = useState<ExpectedUnit | ''>('');
  const field = useQuantity('330R', kind === '' ? undefined : kind);
  const outcome = calculate([field.value, field.unit, field.display], ([value, unit, display]) => ({
    value,
    unit,
    display,
  }));
  return (
    <CalculatorCard
      title="Value reader"
      description="A value as it is printed on a part or a diagram."
      formula="2k2 = 2.2 kΩ · 330R = 330 Ω · 6n8 = 6.8 nF · M22 read as capacitance = 0.22 µF · 0.02 mfd = 20 nF · 8 MF = 8 µF · 1.6 kV"
      source="IEC 60062 letter-and-digit code; SI prefixes; mfd, MF and mmfd as on old American parts; WV, VDC, VAC as printed on ratings"
    >
      <CardFields>
        <QuantityInput label="Value as written" field={field} placeholder="e.g. 330R, 6n8, 8 MF, 350 WVDC" />
        <div className="space-y-1">
          <label htmlFor={kindId} className="block font-semibold">
            Read as
          </label>
          <select
            id={kindId}
            value={kind}
            onChange={(e) => setKind(e.target.value as ExpectedUnit | '')}
            className={inputClass}
          >
            {KINDS.map((k) => (
              <option key={k.unit} value={k.unit}>
                {k.label}
              </option>
            ))}
          </select>
        </div>
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Type a value, for example 330R or 0.02 µF."
        invalid={field.error !== undefined}
      >
        {(r) => (
          <>
            <MainResult label="Value" value={r.display} />
            <ResultList>
              <ResultLine label="Kind">{KINDS.find((k) => k.unit === r.unit)?.noun ?? 'a plain number'}</ResultLine>
              <ResultLine label="In base units">{`${String(r.value)}${r.unit === '' ? '' : ` ${r.unit}`}`}</ResultLine>
            </ResultList>
            {r.unit === '' && <ResultNote>No unit written: choose what it is under “Read as”.</ResultNote>}
          </>
        )}
      </ResultPanel>
    </CalculatorCard>
  );
}
