import type { FindingPatch } from '../../../../shared/schemas/findings';
import { buttonClass } from '../../../components/button';
import { LabelledSwitch } from '../../../components/labelled-switch';

/** Share with the owner (technicians); the owner also needs the photo shared. */
export function ShareWithOwner({ checked, onSave }: { checked: boolean; onSave: (patch: FindingPatch) => void }) {
  return (
    <LabelledSwitch
      label="Share with owner"
      hint={`${checked ? 'Shared. ' : 'Only the team sees this finding. '}The owner sees it only when its photo is shared too.`}
      checked={checked}
      onChange={(ownerVisible) => onSave({ ownerVisible })}
    />
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
  return (
    <span className="inline-flex items-center rounded-full border border-glow bg-glow-soft px-2.5 py-0.5 text-sm font-semibold text-glow-strong">
      Open question
    </span>
  );
}
