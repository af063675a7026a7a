import { Field, inputClass } from '../../../components/field';
import { BAND_OPTIONS, ROLE_NAMES, capitalise, swatchOf } from '../lib/band-colours';
import type { BandRole } from '../lib/band-colours';

/** One band of a resistor: a list of the colours that mean something in this position, named and swatched. */
export function BandSelect({
  band,
  role,
  colour,
  onChange,
}: {
  band: number;
  role: BandRole;
  colour: string;
  onChange: (colour: string) => void;
}) {
  return (
    <Field label={`Band ${band}: ${ROLE_NAMES[role]}`}>
      {(a) => (
        <div className="flex items-center gap-2">
          <span
            aria-hidden="true"
            className="h-11 w-8 shrink-0 rounded-md border border-ink/40"
            style={{ backgroundColor: swatchOf(colour) }}
          />
          <select {...a} value={colour} onChange={(event) => onChange(event.target.value)} className={inputClass}>
            {BAND_OPTIONS[role].map((option) => (
              <option key={option.name} value={option.name}>
                {`${capitalise(option.name)} · ${option.meaning}`}
              </option>
            ))}
          </select>
        </div>
      )}
    </Field>
  );
}
