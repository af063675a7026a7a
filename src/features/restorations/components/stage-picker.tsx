import { stageLabels, stages, type Stage } from '../../../../shared/schemas/restorations';
import { stageGlyphs } from './stage-badge';

/** Moves a restoration through its stages; on hold is possible from any of them. */
export function StagePicker({
  stage,
  onChange,
  disabled,
}: {
  stage: Stage;
  onChange: (s: Stage) => void;
  disabled?: boolean;
}) {
  return (
    <fieldset className="rounded-xl border border-rule bg-panel p-4">
      <legend className="px-1 font-bold">Stage</legend>
      <div className="flex flex-wrap gap-2">
        {stages.map((s) => (
          <label
            key={s}
            className={`inline-flex min-h-11 cursor-pointer items-center gap-2 rounded-lg border px-3 ${s === stage ? 'border-glow bg-glow-soft font-bold' : 'border-rule'}`}
          >
            <input
              type="radio"
              name="stage"
              value={s}
              checked={s === stage}
              disabled={disabled}
              onChange={() => onChange(s)}
              className="sr-only"
            />
            <span aria-hidden="true">{stageGlyphs[s]}</span>
            {stageLabels[s]}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
