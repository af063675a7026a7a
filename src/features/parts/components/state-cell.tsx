import { partStateLabels, type Part } from '../../../../shared/schemas/parts';
import { nextState, StateMark } from './state-mark';
import { formatMediumDate as dateOnly } from '../../../lib/format';

/** A part's state, when it was fitted, and (for technicians) one button to move it on a step. */
export function StateCell({
  part,
  onAdvance,
  busy = false,
}: {
  part: Part;
  onAdvance?: (part: Part) => void;
  busy?: boolean;
}) {
  // A part kept original is neither ordered nor fitted: no step to offer.
  const next = part.action === 'kept-original' ? undefined : nextState(part.state);
  return (
    <div className="flex flex-col items-start gap-1">
      <StateMark state={part.state} />
      {part.state === 'fitted' && part.fittedAt && (
        <time dateTime={part.fittedAt} className="text-xs text-ink-soft">
          {dateOnly(part.fittedAt)}
        </time>
      )}
      {onAdvance && next && (
        <button
          type="button"
          onClick={() => onAdvance(part)}
          disabled={busy}
          aria-label={`Mark ${part.componentRef} ${partStateLabels[next].toLowerCase()}`}
          className="min-h-11 rounded-md border border-rule bg-panel px-2 text-sm font-semibold whitespace-nowrap hover:bg-sunken disabled:opacity-60 print:hidden"
        >
          {partStateLabels[next]} <span aria-hidden="true">›</span>
        </button>
      )}
    </div>
  );
}
