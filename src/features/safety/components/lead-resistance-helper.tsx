import { useId, useState } from 'react';
import { flexSizes, leadResistance } from '../../../../shared/bench';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';

/** Works out the lead's earth-core resistance from its length and size (IEC 60228 flexible copper), for the earth limit. */
export function LeadResistanceHelper({ onUse }: { onUse: (ohms: string) => void }) {
  const id = useId();
  const [metres, setMetres] = useState('');
  const [size, setSize] = useState('0.75');
  const length = Number(metres);
  const ohms = length > 0 ? leadResistance(length, Number(size)) : null;
  return (
    <div className="flex flex-wrap items-end gap-2 text-sm">
      <label htmlFor={`${id}-m`} className="space-y-1">
        <span className="block">Lead length (m)</span>
        <input
          id={`${id}-m`}
          inputMode="decimal"
          className={`${inputClass} w-24`}
          value={metres}
          onChange={(e) => setMetres(e.target.value)}
        />
      </label>
      <label htmlFor={`${id}-s`} className="space-y-1">
        <span className="block">Core size (mm²)</span>
        <select id={`${id}-s`} className={`${inputClass} w-24`} value={size} onChange={(e) => setSize(e.target.value)}>
          {flexSizes.map((s) => (
            <option key={s} value={s}>
              {s}
            </option>
          ))}
        </select>
      </label>
      <Button
        variant="quiet"
        disabled={ohms === null}
        onClick={() => ohms !== null && onUse(String(Number(ohms.toPrecision(3))))}
      >
        {ohms === null ? 'Use the lead’s resistance' : `Use ${Number(ohms.toPrecision(3))} Ω`}
      </Button>
    </div>
  );
}
