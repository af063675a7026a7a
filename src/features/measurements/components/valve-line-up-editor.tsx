import type { Valve } from '../../../../shared/schemas/measurements';
import { buttonClass } from '../../../components/button';
import { inputClass } from '../../../components/field';
import { useLineUpEditor } from '../hooks/use-line-up-editor';
import { HeaterSummaryLine } from './heater-summary-line';
import { LiveChassisCaution } from './live-chassis-caution';
import { ValveDecoded } from './valve-decoded';
import { FormAlert } from '../../../components/form-alert';

const typed = { autoComplete: 'off', autoCorrect: 'off', spellCheck: false } as const;

/**
 * Technicians list the valves by position; each type is decoded as it is typed, and the whole list is saved at once.
 * A line-up that turns out to need series heaters raises the live-chassis caution at once, unless it is `cautioned` already.
 */
export function ValveLineUpEditor({
  restorationId,
  valves,
  cautioned,
  onClose,
}: {
  restorationId: number;
  valves: Valve[];
  cautioned: boolean;
  onClose: () => void;
}) {
  const editor = useLineUpEditor(restorationId, valves, onClose);
  return (
    <form
      noValidate
      aria-label="Change the valve line-up"
      className="space-y-3 rounded-xl border border-rule bg-panel p-4"
      onSubmit={(e) => {
        e.preventDefault();
        editor.submit();
      }}
    >
      {editor.live.likely && !cautioned && <LiveChassisCaution reasons={editor.live.reasons} announce />}
      <ol className="space-y-3">
        {editor.rows.map((row) => {
          const error = editor.errors.get(row.key);
          return (
            <li
              key={row.key}
              className="grid gap-2 border-t border-rule pt-3 sm:grid-cols-[5rem_9rem_1fr_auto] sm:items-start"
              aria-label={`Valve ${row.position}`}
            >
              <input
                {...typed}
                aria-label={`Position of ${row.position || 'new valve'}`}
                value={row.position}
                onChange={(e) => editor.change(row.key, { position: e.target.value.toUpperCase() })}
                className={`${inputClass} font-mono`}
              />
              <input
                {...typed}
                aria-label={`Type of ${row.position}`}
                value={row.type}
                placeholder="e.g. EBF89"
                autoCapitalize="characters"
                onChange={(e) => editor.change(row.key, { type: e.target.value.toUpperCase() })}
                className={`${inputClass} font-mono`}
              />
              <div className="space-y-1">
                <input
                  aria-label={`Notes on ${row.position}`}
                  value={row.notes}
                  placeholder="Notes, e.g. dim but usable"
                  onChange={(e) => editor.change(row.key, { notes: e.target.value })}
                  className={inputClass}
                />
                {row.type.trim() && <ValveDecoded type={row.type} />}
                {error && (
                  <p role="alert" className="text-sm font-semibold text-danger">
                    {error}
                  </p>
                )}
              </div>
              <button
                type="button"
                onClick={() => editor.remove(row.key)}
                aria-label={`Remove ${row.position}`}
                className="min-h-11 rounded-lg px-3 text-ink-soft hover:bg-sunken"
              >
                <span aria-hidden="true">✕</span>
              </button>
            </li>
          );
        })}
      </ol>
      <HeaterSummaryLine types={editor.rows.map((r) => r.type)} />
      {editor.serverMessage && <FormAlert small message={`Not saved: ${editor.serverMessage}`} />}
      <div className="flex flex-wrap gap-2">
        <button type="button" className={buttonClass('quiet')} onClick={editor.add}>
          Add valve
        </button>
        <button type="submit" className={buttonClass('primary')} disabled={editor.saving}>
          {editor.saving ? 'Saving…' : 'Save line-up'}
        </button>
        <button type="button" className={buttonClass('quiet')} onClick={onClose}>
          Cancel
        </button>
      </div>
    </form>
  );
}
