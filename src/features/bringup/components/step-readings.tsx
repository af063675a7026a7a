import { readingKinds } from '../../../../shared/bench';
import { inputClass } from '../../../components/field';
import type { StepDraft } from '../lib/step-draft';

type Row = StepDraft['readings'][number];

/** The readings taken at this step: each becomes an ordinary reading with a verdict (Readings tab, voltage chart). */
export function StepReadings({
  rows,
  errors,
  onChange,
}: {
  rows: Row[];
  errors: Record<string, string>;
  onChange: (rows: Row[]) => void;
}) {
  const set = (i: number, patch: Partial<Row>) => onChange(rows.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  const box = (i: number, key: 'location' | 'expected' | 'tolerance' | 'reading', label: string, mono = true) => {
    const id = `step-reading-${i}-${key}`;
    const error = errors[`readings.${i}.${key}`];
    return (
      <div>
        <label htmlFor={id} className="text-sm font-semibold">
          {label}, row {i + 1}
        </label>
        <input
          id={id}
          value={rows[i]![key]}
          onChange={(e) => set(i, { [key]: e.target.value })}
          aria-invalid={Boolean(error)}
          autoComplete="off"
          spellCheck={false}
          className={`${inputClass} ${mono ? 'font-mono' : ''}`}
        />
        {error && <p className="text-sm font-semibold text-danger">{error}</p>}
      </div>
    );
  };
  return (
    <fieldset className="space-y-2">
      <legend className="font-semibold">Readings at this step</legend>
      <p className="text-sm text-ink-soft">
        Rows left without a reading are not saved. Expected and tolerance (%) give the reading a verdict.
      </p>
      {rows.map((r, i) => (
        <div key={i} className="grid gap-2 rounded-lg bg-sunken p-2 sm:grid-cols-[1.4fr_1fr_1fr_0.7fr_1fr]">
          {box(i, 'location', 'Where', false)}
          <p className="self-end pb-2 text-sm">{readingKinds[r.quantity].label}</p>
          {box(i, 'expected', 'Expected')}
          {box(i, 'tolerance', 'Tolerance (%)')}
          {box(i, 'reading', 'Reading')}
        </div>
      ))}
    </fieldset>
  );
}
