import { signOf } from '../../../lib/format';
import type { VoltagePoint } from './voltage-points';

/** One row of the voltage plot, in per cent of the expected value. */
export interface PlotRow {
  label: string;
  /** The marginal zone (1.5 × the band), which the bar spans; the band is drawn inside it. A limit's is its band. */
  zone: [number, number] | null;
  band: [number, number] | null;
  /** Where the reading's mark goes, held inside the axis; at the left edge when there is nothing to compare with. */
  x: number;
  offScale: 'low' | 'high' | null;
  point: VoltagePoint;
}

/** The marginal zone reaches half the band again beyond it (the bench library's rule). */
const MARGINAL_FACTOR = 1.5;

export function plotRows(points: readonly VoltagePoint[], limit: number): PlotRow[] {
  return points.map((point) => {
    const d = point.deviationPct;
    const offScale = d === null ? null : d > limit ? 'high' : d < -limit ? 'low' : null;
    // A limit passes everything on its side of the expected value, out to the axis's edge, with no marginal zone.
    const side: [number, number] | null =
      point.expected === null
        ? null
        : point.limit === 'maximum'
          ? [-limit, 0]
          : point.limit === 'minimum'
            ? [0, limit]
            : null;
    return {
      label: point.label,
      band: side ?? point.bandPct,
      zone: side ?? (point.bandPct ? [point.bandPct[0] * MARGINAL_FACTOR, point.bandPct[1] * MARGINAL_FACTOR] : null),
      x: d === null ? -limit : Math.max(-limit, Math.min(limit, d)),
      offScale,
      point,
    };
  });
}

/** Axis ticks: the edges, halfway and the expected value. */
export const plotTicks = (limit: number) => [-limit, -limit / 2, 0, limit / 2, limit];

export const formatTick = (v: number) => (v === 0 ? '0' : `${signOf(v)}${Math.abs(v)} %`);
