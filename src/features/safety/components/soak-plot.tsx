import type { SoakSession } from '../../../../shared/schemas/safety';

const W = 320;
const H = 96;

/** A small bar plot of the finished soak runs: one bar per run, its height the hours, red where a fault was seen. */
export function SoakPlot({ sessions }: { sessions: SoakSession[] }) {
  const done = sessions.filter((s) => s.hours !== null);
  if (!done.length) return null;
  const most = Math.max(...done.map((s) => s.hours ?? 0), 0.1);
  const step = W / Math.max(done.length, 1);
  const bar = Math.min(step * 0.7, 40);
  const label = done
    .map((s, i) => `run ${i + 1}: ${(s.hours ?? 0).toFixed(1)} h${s.faults ? ', fault' : ''}`)
    .join('; ');
  return (
    <figure className="space-y-1">
      <svg
        viewBox={`0 0 ${W} ${H + 14}`}
        className="h-28 w-full max-w-md"
        role="img"
        aria-label={`Soak runs: ${label}`}
      >
        <line x1="0" y1={H} x2={W} y2={H} className="stroke-rule" strokeWidth="1" />
        {done.map((s, i) => {
          const h = Math.max(((s.hours ?? 0) / most) * (H - 12), 2);
          const x = i * step + (step - bar) / 2;
          return (
            <g key={s.id}>
              <rect x={x} y={H - h} width={bar} height={h} rx="2" className={s.faults ? 'fill-danger' : 'fill-glow'} />
              <text x={x + bar / 2} y={H - h - 2} textAnchor="middle" className="fill-ink-soft text-[9px]">
                {(s.hours ?? 0).toFixed(1)}
              </text>
              <text x={x + bar / 2} y={H + 11} textAnchor="middle" className="fill-ink-soft text-[9px]">
                {i + 1}
              </text>
            </g>
          );
        })}
      </svg>
      <figcaption className="text-xs text-ink-soft">Hours per run (red: a fault was seen).</figcaption>
    </figure>
  );
}
