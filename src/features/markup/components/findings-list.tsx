import { statusLabels, type Finding } from '../../../../shared/schemas/findings';
import { findingLook } from '../lib/draw-marker';
import { findingLabel } from '../lib/finding-label';
import { MarkerGlyph } from './marker-glyph';

/** The photo's findings as a list, in number order: the way to reach each one by keyboard or screen reader. */
export function FindingsList({
  items,
  selectedId,
  onPick,
}: {
  items: readonly Finding[];
  selectedId?: number;
  onPick: (id: number) => void;
}) {
  const ordered = [...items].sort((a, b) => a.number - b.number);
  return (
    <ol aria-label="Findings on this photo" className="divide-y divide-rule rounded-xl border border-rule bg-panel">
      {ordered.map((f) => {
        const look = findingLook(f.number, f.status, f.severity);
        const current = f.id === selectedId;
        return (
          <li key={f.id}>
            <button
              type="button"
              aria-label={findingLabel(f)}
              aria-current={current ? 'true' : undefined}
              onClick={() => onPick(f.id)}
              className={`flex min-h-11 w-full items-center gap-3 px-3 py-1.5 text-left hover:bg-sunken ${current ? 'bg-glow-soft' : ''}`}
            >
              <MarkerGlyph shape={look.shape} fill={look.fill} ink={look.ink} text={look.text} badge={look.glyph} />
              <span className="min-w-0 flex-1">
                <span className="font-semibold">{f.title}</span>
                {f.componentRef && <span className="ml-2 font-mono text-sm text-ink-soft">{f.componentRef}</span>}
              </span>
              <span className="shrink-0 text-sm text-ink-soft">
                <span aria-hidden="true">{look.glyph} </span>
                {statusLabels[f.status]}
              </span>
            </button>
          </li>
        );
      })}
    </ol>
  );
}
