import { intakeItemWords, type Bringup } from '../../../../shared/schemas/bringup';
import { useSaveIntakeCheck } from '../api/save-intake-check';
import type { PhotoChoice } from '../lib/choices';
import type { FindingChoice } from '../../../components/finding-options';
import { IntakeItemRow } from './intake-item-row';

export interface IntakeChecklistProps {
  restorationId: number;
  intake: Bringup['intake'];
  canRecord: boolean;
  ownerWords: boolean;
  findings: FindingChoice[];
  photos: PhotoChoice[];
}

/** What is looked at before anything is plugged in: ticked, noted, linked to a finding and a photo. */
export function IntakeChecklist({
  restorationId,
  intake,
  canRecord,
  ownerWords,
  findings,
  photos,
}: IntakeChecklistProps) {
  const save = useSaveIntakeCheck(restorationId);
  const done = intake.filter((i) => i.done).length;
  return (
    <section aria-labelledby="intake-heading" className="space-y-3">
      <div>
        <h2 id="intake-heading" className="text-xl font-bold">
          Intake checklist
        </h2>
        <p className="text-sm text-ink-soft">
          {done} of {intake.length} checked. Never plug a set in to see if it works.
        </p>
      </div>
      {canRecord ? (
        <ul className="space-y-3">
          {intake.map((item) => (
            <IntakeItemRow
              key={`${item.item}-${item.checkedAt ?? ''}`}
              value={item}
              findings={findings}
              photos={photos}
              saving={save.isPending && save.variables?.item === item.item}
              error={save.isError && save.variables?.item === item.item ? save.error.message : undefined}
              onSave={(input) => save.mutate(input)}
            />
          ))}
        </ul>
      ) : (
        <ul className="space-y-1">
          {intake.map((item) => (
            <li key={item.item} className="flex gap-2">
              <span aria-hidden="true" className={item.done ? 'text-ok' : 'text-ink-soft'}>
                {item.done ? '✓' : '○'}
              </span>
              <span>
                {ownerWords ? intakeItemWords[item.item].ownerLabel : intakeItemWords[item.item].label}
                <span className="sr-only">{item.done ? ': done' : ': not yet'}</span>
                {!ownerWords && item.note && <span className="block text-sm text-ink-soft">{item.note}</span>}
              </span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
