import { useId, useState } from 'react';
import type { FindingPatch, Status } from '../../../../shared/schemas/findings';
import { Field, inputClass } from '../../../components/field';
import { buttonClass } from '../../../components/button';
import { statusStyle } from '../../../lib/finding-legend';
import { checkDismissReason, workflow } from './finding-edit';
import { StatusGlyph } from '../../../components/status-mark';

const chip =
  'inline-flex min-h-11 items-center gap-1.5 rounded-lg border px-3 py-1.5 text-sm font-semibold transition-colors';

/** The status as a row of buttons in workflow order, and "Dismiss…" which asks why first. */
export function StatusButtons({ status, onChange }: { status: Status; onChange: (patch: FindingPatch) => void }) {
  const labelId = useId();
  const [asking, setAsking] = useState(false);
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string>();

  function dismiss() {
    const checked = checkDismissReason(reason);
    if (!checked.ok) return setError(checked.message);
    onChange({ status: 'dismissed', dismissReason: checked.value });
    setAsking(false);
    setReason('');
    setError(undefined);
  }

  return (
    <div className="space-y-2">
      <div role="group" aria-labelledby={labelId} className="space-y-1">
        <p id={labelId} className="font-semibold">
          Status
        </p>
        <div className="flex flex-wrap gap-1.5">
          {workflow.map((s) => {
            const current = s === status;
            return (
              <button
                key={s}
                type="button"
                aria-pressed={current}
                onClick={() => !current && onChange({ status: s })}
                className={`${chip} ${current ? 'border-ink bg-sunken ring-2 ring-glow' : 'border-rule bg-panel hover:bg-sunken'}`}
              >
                <StatusGlyph status={s} />
                {statusStyle(s).label}
              </button>
            );
          })}
          <button
            type="button"
            aria-pressed={status === 'dismissed'}
            aria-expanded={asking}
            onClick={() => setAsking((open) => !open)}
            className={`${chip} ${status === 'dismissed' ? 'border-ink bg-sunken ring-2 ring-glow' : 'border-rule bg-panel hover:bg-sunken'}`}
          >
            <StatusGlyph status="dismissed" />
            Dismiss…
          </button>
        </div>
      </div>
      {asking && (
        <form
          noValidate
          className="space-y-2 rounded-lg border border-rule bg-sunken p-3"
          onSubmit={(e) => {
            e.preventDefault();
            dismiss();
          }}
        >
          <Field
            label="Why is this finding dismissed?"
            hint="e.g. tested fine: 180 MΩ at 500 V, no leakage"
            error={error}
          >
            {(a) => (
              <textarea
                {...a}
                rows={2}
                value={reason}
                onChange={(e) => setReason(e.target.value)}
                className={inputClass}
                autoFocus
              />
            )}
          </Field>
          <div className="flex flex-wrap gap-2">
            <button type="submit" className={buttonClass('primary')}>
              Dismiss finding
            </button>
            <button type="button" className={buttonClass('quiet')} onClick={() => setAsking(false)}>
              Cancel
            </button>
          </div>
        </form>
      )}
    </div>
  );
}
