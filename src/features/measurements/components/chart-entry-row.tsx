import type { KeyboardEvent } from 'react';
import { inputClass } from '../../../components/field';
import { rowPreview, type EntryRow, type EntryShared } from '../lib/chart-entry';
import { verdictMarks } from '../../../lib/verdict-marks';

const cellInput = `${inputClass} font-mono`;
const ENTRY_COLUMNS = 'sm:grid-cols-[1.4fr_1fr_0.7fr_1fr_0.9fr_8rem_2.75rem]';

/** Column names over the rows, for sighted users on wider screens (each box carries its own label). */
export function ChartEntryHeader() {
  return (
    <div aria-hidden="true" className={`hidden gap-2 text-sm font-semibold text-ink-soft sm:grid ${ENTRY_COLUMNS}`}>
      <span>Location</span>
      <span>Expected</span>
      <span>Tolerance %</span>
      <span>Reading</span>
      <span>Source Ω</span>
      <span>Verdict</span>
    </div>
  );
}
const typed = { autoComplete: 'off', autoCorrect: 'off', spellCheck: false } as const;

/** One point of a voltage chart being entered: where, expected, tolerance, reading, and the verdict so far. */
export function ChartEntryRow({
  row,
  number,
  quantity,
  meters,
  onChange,
  onRemove,
  onEnter,
}: {
  row: EntryRow;
  number: number;
  quantity: EntryShared['quantity'];
  /** The chart's meter and yours, shared by every row. */
  meters: Pick<EntryShared, 'chartMeter' | 'meter'>;
  onChange: (patch: Partial<EntryRow>) => void;
  onRemove: () => void;
  /** Enter moves on to a new row, so a chart goes in without the mouse. */
  onEnter: () => void;
}) {
  const preview = rowPreview(row, quantity, meters);
  const enter = (e: KeyboardEvent) => {
    if (e.key !== 'Enter') return;
    e.preventDefault();
    onEnter();
  };
  const errorId = `chart-entry-error-${row.key}`;
  const message = row.error ?? (preview.status === 'refused' ? preview.message : undefined);
  const input = (
    field: 'location' | 'expected' | 'tolerance' | 'reading' | 'source',
    label: string,
    placeholder: string,
    extra = '',
  ) => (
    <input
      {...typed}
      id={field === 'location' ? `chart-entry-location-${row.key}` : undefined}
      aria-label={`${label}, row ${number}`}
      value={row[field]}
      placeholder={placeholder}
      onChange={(e) => onChange({ [field]: e.target.value })}
      onKeyDown={enter}
      aria-invalid={
        message !== undefined && (row.error !== undefined || (preview.status === 'refused' && preview.field === field))
      }
      aria-describedby={message ? errorId : undefined}
      className={`${field === 'location' ? inputClass : cellInput} ${extra}`}
    />
  );
  return (
    <li className="space-y-1 border-t border-rule pt-2" aria-label={`Row ${number}`}>
      <div className={`grid grid-cols-2 gap-2 sm:items-center ${ENTRY_COLUMNS}`}>
        {input('location', 'Location', 'V5 pin 7')}
        {input('expected', 'Expected', '250 V')}
        {input('tolerance', 'Tolerance (%)', '20')}
        {input('reading', 'Reading', '263 V')}
        {input('source', 'Source resistance', '100k')}
        <span className="text-sm font-semibold">
          {preview.status === 'ready' && (
            <span className={verdictMarks[preview.verdict.verdict].tone} title={preview.verdict.reason}>
              <span aria-hidden="true">{verdictMarks[preview.verdict.verdict].glyph} </span>
              {verdictMarks[preview.verdict.verdict].word}
            </span>
          )}
        </span>
        <button
          type="button"
          onClick={onRemove}
          aria-label={`Remove row ${number}`}
          className="min-h-11 rounded-lg px-3 text-ink-soft hover:bg-sunken"
        >
          <span aria-hidden="true">✕</span>
        </button>
      </div>
      {message && (
        <p id={errorId} role={row.error ? 'alert' : undefined} className="text-sm font-semibold text-danger">
          {message}
        </p>
      )}
    </li>
  );
}
