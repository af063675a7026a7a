import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useChartEntry } from '../hooks/use-chart-entry';
import { ChartEntryHeader, ChartEntryRow } from './chart-entry-row';
import { LiveReadingsNote } from './live-readings-note';

/** Enter the manual's voltage chart point by point and save it all at once (one reading per row). */
export function VoltageChartEntry({ restorationId, onClose }: { restorationId: number; onClose: () => void }) {
  const entry = useChartEntry(restorationId);
  const { shared, setShared } = entry;
  return (
    <form
      noValidate
      aria-label="Enter a voltage chart"
      className="space-y-3 rounded-xl border border-rule bg-panel p-4"
      onSubmit={(e) => {
        e.preventDefault();
        void entry.saveAll();
      }}
    >
      <h3 className="text-lg font-bold">Enter a voltage chart</h3>
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="Kind">
          {(a) => (
            <select
              {...a}
              className={inputClass}
              value={shared.quantity}
              onChange={(e) =>
                setShared({ ...shared, quantity: e.target.value === 'ac-voltage' ? 'ac-voltage' : 'dc-voltage' })
              }
            >
              <option value="dc-voltage">DC voltage</option>
              <option value="ac-voltage">AC voltage</option>
            </select>
          )}
        </Field>
        <Field label="Conditions" hint="e.g. 236 V mains on the 245 V tap, no signal">
          {(a) => (
            <input
              {...a}
              className={inputClass}
              value={shared.conditions}
              onChange={(e) => setShared({ ...shared, conditions: e.target.value })}
            />
          )}
        </Field>
        <Field label="Method" hint="Meter and its Ω/V, e.g. DMM 10 MΩ or 20 kΩ/V">
          {(a) => (
            <input
              {...a}
              className={inputClass}
              value={shared.method}
              onChange={(e) => setShared({ ...shared, method: e.target.value })}
            />
          )}
        </Field>
      </div>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Chart’s meter (optional)" hint="Service charts name their meter: Ω/V and range, e.g. 1k/V 300 V">
          {(a) => (
            <input
              {...a}
              className={`${inputClass} font-mono`}
              value={shared.chartMeter}
              autoComplete="off"
              spellCheck={false}
              onChange={(e) => setShared({ ...shared, chartMeter: e.target.value })}
            />
          )}
        </Field>
        <Field label="Your meter (optional)" hint="e.g. 10 MΩ, or 20k/V 300 V">
          {(a) => (
            <input
              {...a}
              className={`${inputClass} font-mono`}
              value={shared.meter}
              autoComplete="off"
              spellCheck={false}
              onChange={(e) => setShared({ ...shared, meter: e.target.value })}
            />
          )}
        </Field>
      </div>
      <p className="text-sm text-ink-soft">
        Tolerance in per cent; blank for the usual ±20 %. With both meters and a row’s source resistance (the anode load
        feeding the point), that row is judged against what your meter should read there. Enter in any box starts a new
        row.
      </p>
      <ChartEntryHeader />
      <ol className="space-y-2">
        {entry.rows.map((row, i) => (
          <ChartEntryRow
            key={row.key}
            row={row}
            number={i + 1}
            quantity={shared.quantity}
            meters={shared}
            onChange={(patch) => entry.change(row.key, patch)}
            onRemove={() => entry.removeRow(row.key)}
            onEnter={() =>
              i === entry.rows.length - 1
                ? entry.addRow()
                : document.getElementById(`chart-entry-location-${entry.rows[i + 1]!.key}`)?.focus()
            }
          />
        ))}
      </ol>
      <label className="flex min-h-11 items-center gap-2">
        <input
          type="checkbox"
          className="h-5 w-5 accent-glow"
          checked={shared.ownerVisible}
          onChange={(e) => setShared({ ...shared, ownerVisible: e.target.checked })}
        />
        Share these readings with the owner
      </label>
      <LiveReadingsNote />
      {entry.savedCount !== null && (
        <p role="status" className="text-sm">
          {entry.savedCount === 1 ? '1 point saved.' : `${entry.savedCount} points saved.`}
          {entry.rows.some((r) => r.error) ? ' The rows left need attention.' : ''}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <button type="button" className={buttonClass('quiet')} onClick={() => entry.addRow()}>
          Add row
        </button>
        <button type="submit" className={buttonClass('primary')} disabled={entry.saving || entry.filledCount === 0}>
          {entry.saving ? 'Saving…' : `Save all (${entry.filledCount})`}
        </button>
        <button type="button" className={buttonClass('quiet')} onClick={onClose}>
          Close
        </button>
      </div>
    </form>
  );
}
