import { useId, useState } from 'react';
import {
  BenchInputError,
  formatQuantity,
  frequencyOf,
  IF_PRESETS,
  parseQuantity,
  wavelengthOf,
} from '../../../../shared/bench';
import { inputClass } from '../../../components/field';
import { formatDifference } from '../../../lib/format';
import { useQuantity } from '../hooks/use-quantity';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';
import { SafetyNote } from './safety-note';
import { TextInput } from './text-input';
import { VerdictMark } from './verdict-mark';

/** A dial mark in metres ("1500 m") or in hertz ("200 kHz"), turned into the other. */
function dialMark(text: string): { frequency: string; wavelength: string } {
  const metres = /^(\d+(?:\.\d+)?)\s*m$/i.exec(text.trim());
  if (metres) {
    const hertz = frequencyOf(Number(metres[1]));
    return { frequency: formatQuantity(hertz, 'Hz'), wavelength: `${Number(metres[1])} m` };
  }
  const q = parseQuantity(text, { expectUnit: 'Hz' });
  if (q.value <= 0) throw new BenchInputError('A frequency must be above zero.');
  return { frequency: formatQuantity(q.value, 'Hz'), wavelength: `${Number(wavelengthOf(q.value).toPrecision(4))} m` };
}

/** IF presets with an absolute tolerance, and wavelength ↔ frequency for dial scales. */
export function AlignmentCard() {
  const presetId = useId();
  const [preset, setPreset] = useState(String(IF_PRESETS[2]?.hertz ?? 468e3));
  const measured = useQuantity('466.5k', 'Hz');
  const [mark, setMark] = useState('1500 m');
  const chosen = IF_PRESETS.find((p) => String(p.hertz) === preset) ?? IF_PRESETS[0]!;
  const ifOutcome = calculate([measured.value], ([hertz]) => {
    const off = hertz - chosen.hertz;
    const size = Math.abs(off);
    const verdict = size <= chosen.toleranceHertz ? 'within' : size <= 1.5 * chosen.toleranceHertz ? 'marginal' : 'out';
    return {
      verdict,
      off: formatDifference(off, 'Hz', '+'),
      tolerance: `±${formatQuantity(chosen.toleranceHertz, 'Hz')}`,
    } as const;
  });
  const dial = calculate([mark.trim() === '' ? undefined : mark], ([text]) => dialMark(text));
  return (
    <CalculatorCard
      title="Alignment aids"
      description="An IF against its nominal frequency, and a dial mark in metres or kilohertz."
      formula="λ[m] = 300,000 ÷ f[kHz]; IF judged by how many kHz it is off, not by per cent"
      source="Wavelength from the speed of light (3 × 10⁸ m/s); IF tolerances ±2 kHz (AM) and ±25 kHz (10.7 MHz FM): common practice, no source"
    >
      <CardFields>
        <div className="space-y-1">
          <label htmlFor={presetId} className="block font-semibold">
            Set’s IF
          </label>
          <select id={presetId} value={preset} onChange={(e) => setPreset(e.target.value)} className={inputClass}>
            {IF_PRESETS.map((p) => (
              <option key={p.hertz} value={String(p.hertz)}>
                {p.label}
              </option>
            ))}
          </select>
        </div>
        <QuantityInput label="IF measured (Hz)" field={measured} placeholder="e.g. 466.5k" />
      </CardFields>
      <ResultPanel outcome={ifOutcome} waiting="Type the IF you measured." invalid={anyInvalid(measured)}>
        {(r) => (
          <>
            <VerdictMark verdict={r.verdict} />
            <ResultList>
              <ResultLine label="Off by">{r.off}</ResultLine>
              <ResultLine label="Allowed">{r.tolerance}</ResultLine>
            </ResultList>
          </>
        )}
      </ResultPanel>
      <TextInput
        label="Dial mark"
        value={mark}
        onChange={setMark}
        placeholder="e.g. 1500 m, 200 kHz, 98.5 MHz"
        hint="In metres (end with m) or in hertz."
      />
      <ResultPanel outcome={dial} waiting="Type a dial mark in metres or kilohertz.">
        {(r) => (
          <>
            <MainResult label="Frequency" value={r.frequency} />
            <ResultList>
              <ResultLine label="Wavelength">{r.wavelength}</ResultLine>
            </ResultList>
            <ResultNote>
              Old dials marked in metres use the rounded speed of light; stations were listed either way.
            </ResultNote>
          </>
        )}
      </ResultPanel>
      <SafetyNote>
        <p>
          Alignment is done on a powered set: use an insulated trimming tool and keep the other hand clear of the
          chassis.
        </p>
      </SafetyNote>
    </CalculatorCard>
  );
}
