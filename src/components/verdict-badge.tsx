import { verdictMarks, type Verdict } from '../lib/verdict-marks';

/** A verdict as glyph and word; `reason` becomes the hover text. */
export function VerdictBadge({
  verdict,
  reason,
  large = false,
}: {
  verdict: Verdict;
  reason?: string;
  large?: boolean;
}) {
  const mark = verdictMarks[verdict];
  return (
    <span
      title={reason}
      className={`inline-flex items-center gap-1 rounded-full border-2 bg-panel font-bold whitespace-nowrap ${large ? 'px-3 py-0.5 text-lg' : 'px-2 text-sm'} ${mark.tone}`}
    >
      <span aria-hidden="true">{mark.glyph}</span>
      {mark.word}
    </span>
  );
}
