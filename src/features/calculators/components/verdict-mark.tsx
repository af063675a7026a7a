import type { Verdict } from '../lib/bench-advice';

// Never colour alone: each verdict carries its glyph and its word.
const MARKS: Record<Verdict, { glyph: string; word: string; tone: string }> = {
  within: { glyph: '✓', word: 'within', tone: 'border-ok text-ok' },
  marginal: { glyph: '◐', word: 'marginal', tone: 'border-glow text-glow-strong' },
  out: { glyph: '✕', word: 'out', tone: 'border-danger text-danger' },
};

export function VerdictMark({ verdict }: { verdict: Verdict }) {
  const mark = MARKS[verdict];
  return (
    <span
      className={`inline-flex items-center gap-1.5 rounded-full border-2 bg-panel px-3 py-0.5 text-lg font-bold ${mark.tone}`}
    >
      <span aria-hidden="true">{mark.glyph}</span>
      {mark.word}
    </span>
  );
}
