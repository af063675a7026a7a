import type { TimelineEvent } from '../../../../shared/schemas/events';
import { eventKindLabels, eventKinds } from '../lib/event-kinds';

type Kind = TimelineEvent['kind'];

const chipClass = (pressed: boolean) =>
  `inline-flex min-h-11 items-center gap-2 rounded-full border px-3.5 py-1.5 text-sm font-semibold transition-colors ${
    pressed
      ? 'border-glow bg-glow-soft text-glow-strong'
      : 'border-rule bg-panel text-ink-soft hover:bg-sunken hover:text-ink'
  }`;

function Count({ n }: { n: number }) {
  return <span className="rounded-full bg-sunken px-2 text-xs text-ink tabular-nums">{n}</span>;
}

/**
 * Toggle chips, one per kind that has events; several can be on at once. "Everything" is on when none is.
 * Plain buttons with aria-pressed, so Tab reaches them and Space or Enter toggles them.
 */
export function KindFilter({
  counts,
  shown,
  total,
  onToggle,
  onClear,
}: {
  counts: Record<Kind, number>;
  shown: ReadonlySet<Kind>;
  total: number;
  onToggle: (kind: Kind) => void;
  onClear: () => void;
}) {
  return (
    <div role="group" aria-label="Show events of these kinds" className="flex flex-wrap gap-2">
      <button type="button" aria-pressed={shown.size === 0} onClick={onClear} className={chipClass(shown.size === 0)}>
        Everything <Count n={total} />
      </button>
      {eventKinds
        .filter((kind) => counts[kind] > 0)
        .map((kind) => (
          <button
            key={kind}
            type="button"
            aria-pressed={shown.has(kind)}
            onClick={() => onToggle(kind)}
            className={chipClass(shown.has(kind))}
          >
            {eventKindLabels[kind]} <Count n={counts[kind]} />
          </button>
        ))}
    </div>
  );
}
