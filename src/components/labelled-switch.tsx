import { useId, type ReactNode } from 'react';

/** An on/off switch that says its state in words (the hint) as well as by position and colour. */
export function LabelledSwitch({
  label,
  hint,
  checked,
  onChange,
  disabled,
}: {
  label: string;
  hint: ReactNode;
  checked: boolean;
  onChange: (next: boolean) => void;
  disabled?: boolean;
}) {
  const labelId = useId();
  const hintId = useId();
  return (
    <div className="flex min-h-11 items-center justify-between gap-3">
      <div>
        <p id={labelId} className="font-semibold">
          {label}
        </p>
        <p id={hintId} className="text-sm text-ink-soft">
          {hint}
        </p>
      </div>
      <button
        type="button"
        role="switch"
        aria-checked={checked}
        aria-labelledby={labelId}
        aria-describedby={hintId}
        disabled={disabled}
        onClick={() => onChange(!checked)}
        className={`relative inline-flex h-8 w-14 shrink-0 items-center rounded-full border transition-colors disabled:opacity-60 ${
          checked ? 'border-glow bg-glow' : 'border-rule bg-sunken'
        }`}
      >
        <span
          aria-hidden="true"
          className={`inline-flex h-6 w-6 items-center justify-center rounded-full text-xs font-bold shadow transition-transform motion-reduce:transition-none ${
            checked ? 'translate-x-7 bg-panel text-glow-strong' : 'translate-x-1 bg-ink-soft'
          }`}
        >
          {checked ? '✓' : ''}
        </span>
      </button>
    </div>
  );
}
