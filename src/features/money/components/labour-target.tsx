import { stageLabels, stages, type Stage } from '../../../../shared/schemas/restorations';
import { inputClass } from '../../../components/field';
import { useRestorationFindings } from '../../../lib/queries/get-restoration-findings';
import type { LabourTarget } from '../api/labour';

/** "stage:repair" or "finding:12": what a time entry is for, as one select value. */
export type TargetValue = `stage:${Stage}` | `finding:${number}`;

export function targetOf(value: TargetValue): Pick<LabourTarget, 'findingId' | 'stage'> {
  const [kind, id] = value.split(':') as [string, string];
  return kind === 'finding' ? { findingId: Number(id), stage: null } : { findingId: null, stage: id as Stage };
}

/** Picks the stage or the finding the time is for; findings load in the background and join the list. */
export function LabourTargetSelect({
  restorationId,
  id,
  value,
  onChange,
}: {
  restorationId: number;
  id: string;
  value: TargetValue;
  onChange: (v: TargetValue) => void;
}) {
  const findings = useRestorationFindings(restorationId);
  return (
    <select id={id} className={inputClass} value={value} onChange={(e) => onChange(e.target.value as TargetValue)}>
      <optgroup label="Stage">
        {stages.map((s) => (
          <option key={s} value={`stage:${s}`}>
            {stageLabels[s]}
          </option>
        ))}
      </optgroup>
      {findings.data && findings.data.length > 0 && (
        <optgroup label="Finding">
          {findings.data.map((f) => (
            <option key={f.id} value={`finding:${f.id}`}>
              #{f.number} {f.title}
            </option>
          ))}
        </optgroup>
      )}
    </select>
  );
}

/** Minutes as a clock reads them: 1:05:09 or 5:09. */
export function clockText(totalSeconds: number): string {
  const s = Math.max(0, Math.floor(totalSeconds));
  const h = Math.floor(s / 3600);
  const mm = String(Math.floor((s % 3600) / 60)).padStart(h ? 2 : 1, '0');
  const ss = String(s % 60).padStart(2, '0');
  return h ? `${h}:${mm}:${ss}` : `${mm}:${ss}`;
}
