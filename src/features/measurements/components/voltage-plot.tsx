import { Bar, ComposedChart, ReferenceLine, Scatter, XAxis, YAxis } from 'recharts';
import { formatTick, plotRows, plotTicks } from '../lib/plot-rows';
import { plotLimit, plotSummary, type VoltagePoint } from '../lib/voltage-points';
import { BandShape, ReadingShape } from './voltage-plot-shapes';

const ROW = 48;

/**
 * Every point on one axis in per cent of its expected value, so a 2 V cathode and a 250 V anode read alike:
 * the band, the expected tick at 0, and the reading's mark. The figure carries its summary in words;
 * the table beside it is the full equivalent. `width` fixes the size (otherwise it follows its container).
 */
export function VoltagePlot({ points, width }: { points: VoltagePoint[]; width?: number }) {
  const limit = plotLimit(points);
  const rows = plotRows(points, limit);
  const height = rows.length * ROW + 64;
  const size = width === undefined ? { responsive: true, style: { width: '100%', height } } : { width, height };
  return (
    <div role="img" aria-label={plotSummary(points)} className="text-ink">
      <ComposedChart
        {...size}
        data={rows}
        layout="vertical"
        margin={{ top: 20, right: 48, bottom: 24, left: 8 }}
        accessibilityLayer={false}
      >
        <XAxis
          type="number"
          domain={[-limit, limit]}
          ticks={plotTicks(limit)}
          tickFormatter={formatTick}
          stroke="currentColor"
          tick={{ fill: 'currentColor', fontSize: 13 }}
          label={{
            value: 'Reading against the manual’s value',
            position: 'insideBottom',
            offset: -16,
            fill: 'currentColor',
            fontSize: 13,
          }}
        />
        <YAxis
          type="category"
          dataKey="label"
          width={120}
          stroke="currentColor"
          tick={{ fill: 'currentColor', fontSize: 13 }}
        />
        <ReferenceLine x={0} stroke="currentColor" strokeDasharray="3 4" strokeOpacity={0.5} />
        <Bar dataKey="zone" barSize={16} shape={BandShape} isAnimationActive={false} />
        <Scatter dataKey="x" shape={ReadingShape} isAnimationActive={false} />
      </ComposedChart>
    </div>
  );
}
