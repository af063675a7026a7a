import type { PartWarning } from '../../../../shared/bench';

/** Each level's glyph and word travel with its colour, so a warning reads the same in print or without colour. */
const looks: Record<PartWarning['level'], { glyph: string; word: string; className: string }> = {
  danger: { glyph: '⚠', word: 'Danger', className: 'border-danger/50 bg-danger-soft text-danger' },
  caution: { glyph: '◐', word: 'Caution', className: 'border-glow/50 bg-glow-soft text-glow-strong' },
};

/** A part's warnings, gravest first, each as glyph, word and message. */
export function WarningList({ warnings, className = '' }: { warnings: PartWarning[]; className?: string }) {
  if (warnings.length === 0) return null;
  const sorted = [...warnings].sort((a, b) => (a.level === b.level ? 0 : a.level === 'danger' ? -1 : 1));
  return (
    <ul className={`space-y-1 ${className}`}>
      {sorted.map((w) => {
        const look = looks[w.level];
        return (
          <li key={`${w.level}:${w.message}`} className={`rounded-md border px-2 py-1 text-sm ${look.className}`}>
            <strong className="whitespace-nowrap">
              <span aria-hidden="true">{look.glyph} </span>
              {look.word}:
            </strong>{' '}
            <span className="text-ink print:text-black">{w.message}</span>
          </li>
        );
      })}
    </ul>
  );
}
