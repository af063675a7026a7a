import { useState } from 'react';
import { can, type Role } from '../../../../shared/permissions';
import type { Measurement } from '../../../../shared/schemas/measurements';
import { buttonClass } from '../../../components/button';
import { EmptyState } from '../../../components/states';
import { voltagePoints } from '../lib/voltage-points';
import { VoltageChartEntry } from './voltage-chart-entry';
import { VoltagePlot } from './voltage-plot';
import { VoltageTable } from './voltage-table';

function MeterLoadingNote() {
  return (
    <p role="note" className="rounded-lg border-l-4 border-glow bg-glow-soft px-3 py-2 text-sm">
      Charts assume the meter stated in the manual; a 20 kΩ/V or digital meter reads anodes and screens high.
    </p>
  );
}

function Legend() {
  return (
    <p className="text-sm text-ink-soft">
      Each row: the green band is the tolerance, the lighter zone around it marginal, the upright tick the manual’s
      value; the mark is the reading — <span className="text-ok">● ✓ within</span>,{' '}
      <span className="text-glow-strong">◆ ◐ marginal</span>, <span className="text-danger">✕ out</span>.
    </p>
  );
}

/**
 * The DC and AC voltage readings against the manual's chart: a plot where a glance finds the odd one out, the same
 * in a table, and (for technicians) a way to enter a whole chart at once. `plotWidth` fixes the plot's size.
 */
export function VoltageChart({
  restorationId,
  role,
  measurements,
  plotWidth,
}: {
  restorationId: number;
  role: Role;
  measurements: Measurement[];
  plotWidth?: number;
}) {
  const [entering, setEntering] = useState(false);
  const points = voltagePoints(measurements);
  const canRecord = can(role, 'measurements.record');
  return (
    <div className="space-y-3">
      <MeterLoadingNote />
      {points.length === 0 ? (
        <EmptyState title="No voltage readings yet">
          {canRecord
            ? 'Enter the points of the manual’s voltage chart below, or record DC and AC voltages one at a time.'
            : 'Voltage readings will be plotted here.'}
        </EmptyState>
      ) : (
        <div className="space-y-3">
          <figure className="space-y-2 rounded-xl border border-rule bg-panel p-3">
            <VoltagePlot points={points} width={plotWidth} />
            <figcaption>
              <Legend />
            </figcaption>
          </figure>
          <VoltageTable points={points} />
        </div>
      )}
      {canRecord &&
        (entering ? (
          <VoltageChartEntry restorationId={restorationId} onClose={() => setEntering(false)} />
        ) : (
          <button type="button" className={buttonClass('quiet')} onClick={() => setEntering(true)}>
            Enter a voltage chart
          </button>
        ))}
    </div>
  );
}
