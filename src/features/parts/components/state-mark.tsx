import { partStateLabels, partStates, type Part } from '../../../../shared/schemas/parts';

type State = Part['state'];

const glyphs: Record<State, string> = { planned: '○', ordered: '◔', fitted: '●' };
const tones: Record<State, string> = { planned: 'text-ink-soft', ordered: 'text-glow-strong', fitted: 'text-ok' };

/** The state after `state` on the way planned → ordered → fitted; none after fitted. */
export const nextState = (state: State): State | undefined => partStates[partStates.indexOf(state) + 1];

/** A part's state as glyph and word, never colour alone. */
export function StateMark({ state }: { state: State }) {
  return (
    <span className={`inline-flex items-center gap-1 font-semibold whitespace-nowrap ${tones[state]}`}>
      <span aria-hidden="true">{glyphs[state]}</span>
      {partStateLabels[state]}
    </span>
  );
}
