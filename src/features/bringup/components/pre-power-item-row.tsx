import { useState, type ReactNode } from 'react';
import {
  prePowerItemWords,
  prePowerStatuses,
  prePowerStatusLabels,
  type Bringup,
  type PrePowerCheckInput,
  type PrePowerStatus,
} from '../../../../shared/schemas/bringup';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';

type Item = Bringup['prePower']['items'][number];

export interface PrePowerItemRowProps {
  value: Item;
  signedOff: boolean;
  saving: boolean;
  error?: string;
  onSave: (input: PrePowerCheckInput) => void;
  /** Shown under the item, e.g. the tap arithmetic beside "mains tap matched". */
  children?: ReactNode;
}

/** One pre-power item: done, not applicable (why) or waived (why, and it shows in red wherever it is read). */
export function PrePowerItemRow({ value, signedOff, saving, error, onSave, children }: PrePowerItemRowProps) {
  const words = prePowerItemWords[value.item];
  const [status, setStatus] = useState<PrePowerStatus | null>(value.status);
  const [reason, setReason] = useState(value.reason);
  const needsReason = status === 'not-applicable' || status === 'waived';
  const changed = status !== value.status || (needsReason && reason !== value.reason);
  const base = `pre-power-${value.item}`;
  const waived = value.status === 'waived';
  return (
    <li className={`space-y-2 rounded-lg border bg-panel p-3 ${waived ? 'border-danger' : 'border-rule'}`}>
      <fieldset className="space-y-2">
        <legend className="font-semibold">{words.label}</legend>
        <p className="text-sm text-ink-soft">{words.hint}</p>
        <div className="flex flex-wrap gap-x-5 gap-y-1">
          {prePowerStatuses.map((s) => (
            <label key={s} className="inline-flex min-h-11 items-center gap-2">
              <input
                type="radio"
                name={`${base}-status`}
                value={s}
                checked={status === s}
                onChange={() => setStatus(s)}
                className="h-4 w-4 accent-glow"
              />
              <span className={s === 'waived' ? 'text-danger' : ''}>{prePowerStatusLabels[s]}</span>
            </label>
          ))}
        </div>
        {needsReason && (
          <div>
            <label htmlFor={`${base}-reason`} className="text-sm font-semibold">
              Reason {status === 'waived' ? 'for waiving it' : 'it does not apply'}
            </label>
            <input
              id={`${base}-reason`}
              value={reason}
              maxLength={300}
              onChange={(e) => setReason(e.target.value)}
              className={inputClass}
              aria-required="true"
            />
          </div>
        )}
      </fieldset>
      {waived && (
        <p className="text-sm font-semibold text-danger">
          Waived: {value.reason}. This shows in red in the history and on the report.
        </p>
      )}
      {children}
      <div className="flex flex-wrap items-center gap-3">
        <Button
          variant={status === 'waived' ? 'danger' : 'quiet'}
          disabled={!changed || saving || (needsReason && !reason.trim())}
          onClick={() => onSave({ item: value.item, status, reason: needsReason ? reason : '' })}
        >
          {saving ? 'Saving…' : `Save: ${words.label.toLowerCase()}`}
        </Button>
        {changed && signedOff && (
          <span className="text-sm font-semibold text-danger">Saving this withdraws the sign-off.</span>
        )}
        {changed && needsReason && !reason.trim() && (
          <span className="text-sm text-ink-soft">Give the reason to save.</span>
        )}
        {value.checkedBy && !changed && <span className="text-sm text-ink-soft">Marked by {value.checkedBy}</span>}
      </div>
      {error && (
        <p role="alert" className="text-sm font-semibold text-danger">
          {error}
        </p>
      )}
    </li>
  );
}
