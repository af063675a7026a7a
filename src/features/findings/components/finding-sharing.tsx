import { useId } from 'react';
import type { FindingPatch } from '../../../../shared/schemas/findings';
import { buttonClass } from '../../../components/button';

/** Share with the owner (technicians): an on/off switch that says its state in words as well. */
export function ShareWithOwner({ checked, onSave }: { checked: boolean; onSave: (patch: FindingPatch) => void }) {
  const labelId = useId();
  const hintId = useId();
  return (
    <div className="flex min-h-11 items-center justify-between gap-3">
      <div>
        <p id={labelId} className="font-semibold">
          Share with owner
        </p>
        <p id={hintId} className="text-sm text-ink-soft">
          {checked ? 'Shared. ' : 'Only the team sees this finding. '}
          The owner sees it only when its photo is shared too.
        </p>
      </div>
      <button
        type="button"
        role="switch"
        aria-checked={checked}
        aria-labelledby={labelId}
        aria-describedby={hintId}
        onClick={() => onSave({ ownerVisible: !checked })}
        className={`relative inline-flex h-8 w-14 shrink-0 items-center rounded-full border transition-colors ${checked ? 'border-glow bg-glow' : 'border-rule bg-sunken'}`}
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

/** A technician opens a question for the mentors; a technician or mentor resolves it. */
export function QuestionToggle({
  open,
  canAsk,
  canResolve,
  onSave,
}: {
  open: boolean;
  canAsk: boolean;
  canResolve: boolean;
  onSave: (patch: FindingPatch) => void;
}) {
  if (open && canResolve)
    return (
      <button type="button" className={buttonClass('quiet')} onClick={() => onSave({ questionOpen: false })}>
        ✓ Resolve question
      </button>
    );
  if (!open && canAsk)
    return (
      <button type="button" className={buttonClass('quiet')} onClick={() => onSave({ questionOpen: true })}>
        Ask the mentors
      </button>
    );
  return null;
}

export function OpenQuestionBadge() {
  return <span className="inline-flex items-center rounded-full border border-glow bg-glow-soft px-2.5 py-0.5 text-sm font-semibold text-glow-strong">Open question</span>;
}
