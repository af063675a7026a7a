import type { Stage } from '../../../../shared/schemas/restorations';
import { stageInWords } from '../lib/owner-words';

/** The stage in the owner's words, with a glyph so it does not rest on colour: a tick when ready, a clock while in work. */
export function StageWords({ stage }: { stage: Stage }) {
  const ready = stage === 'returned';
  return (
    <p
      className={`inline-flex items-center gap-2 rounded-full px-3 py-1 text-sm font-semibold ${ready ? 'bg-glow-soft text-glow-strong' : 'bg-sunken text-ink-soft'}`}
    >
      <svg
        viewBox="0 0 20 20"
        aria-hidden="true"
        className="h-4 w-4"
        fill="none"
        stroke="currentColor"
        strokeWidth={2}
        strokeLinecap="round"
        strokeLinejoin="round"
      >
        {ready ? (
          <path d="m4 10.5 4 4 8-9" />
        ) : (
          <>
            <circle cx="10" cy="10" r="7" />
            <path d="M10 6v4l2.5 2.5" />
          </>
        )}
      </svg>
      {stageInWords(stage)}
    </p>
  );
}
