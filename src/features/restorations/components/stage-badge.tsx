import { stageLabels, type Stage } from '../../../../shared/schemas/restorations';

/** Each stage has a glyph as well as a word, so it reads without colour. */
const glyphs: Record<Stage, string> = {
  intake: '◇',
  assessment: '◈',
  repair: '◆',
  testing: '◎',
  returned: '✓',
  'on-hold': '‖',
};

export function StageBadge({ stage }: { stage: Stage }) {
  return (
    <span className="inline-flex items-center gap-1 rounded-full border border-rule bg-sunken px-2 py-0.5 text-xs font-semibold text-ink-soft">
      <span aria-hidden="true">{glyphs[stage]}</span>
      {stageLabels[stage]}
    </span>
  );
}

export { glyphs as stageGlyphs };
