import type { BarShapeProps, ScatterShapeProps } from 'recharts';
import type { PlotRow } from '../lib/plot-rows';
import { verdictMarks } from '../../../lib/verdict-marks';
import { voltsText } from '../lib/voltage-points';

/** The tolerance band as a shaded range inside its lighter marginal zone, with the expected value as a tick. */
export function BandShape({ x, y, width, height, payload }: BarShapeProps) {
  const row = payload as PlotRow | undefined;
  if (!row?.zone || !row.band) return <g />;
  const [lo, hi] = row.zone;
  const at = (v: number) => (hi === lo ? x : x + (width * (v - lo)) / (hi - lo));
  const bandX = at(row.band[0]);
  return (
    <g>
      <rect x={x} y={y} width={Math.max(0, width)} height={height} className="fill-glow-soft stroke-rule" />
      <rect
        x={bandX}
        y={y}
        width={Math.max(0, at(row.band[1]) - bandX)}
        height={height}
        className="fill-ok/25 stroke-ok/60"
      />
      <line x1={at(0)} x2={at(0)} y1={y - 4} y2={y + height + 4} stroke="currentColor" strokeWidth={2} />
    </g>
  );
}

function Mark({ verdict, cx, cy }: { verdict: PlotRow['point']['verdict']; cx: number; cy: number }) {
  const svg = verdictMarks[verdict].svg;
  switch (verdict) {
    case 'within':
      return <circle cx={cx} cy={cy} r={6} className={svg} strokeWidth={1.5} />;
    case 'marginal':
      return (
        <path
          d={`M${cx} ${cy - 8}L${cx + 8} ${cy}L${cx} ${cy + 8}L${cx - 8} ${cy}Z`}
          className={svg}
          strokeWidth={1.5}
        />
      );
    case 'out':
      return (
        <path
          d={`M${cx - 7} ${cy - 7}L${cx + 7} ${cy + 7}M${cx + 7} ${cy - 7}L${cx - 7} ${cy + 7}`}
          className={svg}
          strokeWidth={3.5}
          strokeLinecap="round"
        />
      );
    case 'unknown':
      return null;
  }
}

/** The reading: a mark whose shape and colour say the verdict, labelled with the glyph and the value. */
export function ReadingShape({ cx, cy, payload }: ScatterShapeProps) {
  const row = payload as PlotRow | undefined;
  if (!row || cx === undefined || cy === undefined) return <g />;
  const { point } = row;
  const mark = verdictMarks[point.verdict];
  const value = voltsText(point.reading);
  const text =
    point.verdict === 'unknown'
      ? `? ${value}, no expected value`
      : `${mark.glyph} ${value}${row.offScale === 'high' ? ' ▸ off scale' : row.offScale === 'low' ? ' ◂ off scale' : ''}`;
  // Held inside the plot: a label at an edge grows inwards.
  const anchor =
    point.verdict === 'unknown' || row.offScale === 'low' ? 'start' : row.offScale === 'high' ? 'end' : 'middle';
  return (
    <g>
      <Mark verdict={point.verdict} cx={cx} cy={cy} />
      <text x={cx} y={cy - 12} textAnchor={anchor} fontSize={13} fontWeight={700} className={mark.svg.split(' ')[0]}>
        {text}
      </text>
    </g>
  );
}
