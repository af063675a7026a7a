import { requirePositive, scaleByPowerOfTen } from './bench-input-error';

/** What an ESR limit rests on, so a stored reading can say which table judged it. */
export interface EsrLimitDetail {
  /** Expected maximum ESR in ohms for a healthy new part. */
  ohms: number;
  /** Name of the table followed. */
  table: string;
  /** Frequency in hertz the table's figures apply to (ESR meters of the ~100 kHz class). */
  testHertz: number;
  /** True when the capacitance or voltage lies outside the table and an edge value was used. */
  extrapolated: boolean;
  note: string;
}

const TABLE_NAME = "Table A: technicians' worst-case ESR of new aluminium electrolytics, 100 kHz, 20 °C";

// Table A as published (the worst-case ESR chart for new electrolytics at 20 °C), ohms. null = no figure given ("—").
// "<14"-style entries are stored as 14: the table gives a maximum anyway.
const VOLT_COLUMNS = [10, 16, 25, 35, 63, 100, 250] as const;
const ROWS: ReadonlyArray<readonly [microfarads: number, ohms: ReadonlyArray<number | null>]> = [
  [1, [null, null, null, 14, 16, 18, 20]],
  [2.2, [null, null, 6.0, 8.0, 10, 10, 18]],
  [4.7, [null, null, 15, 7.5, 4.2, 2.3, 5.0]],
  [10, [null, 8.0, 5.3, 3.2, 2.4, 3.0, 2.5]],
  [22, [5.4, 3.6, 2.1, 1.5, 1.5, 1.5, 1.8]],
  [47, [2.2, 1.6, 1.2, 0.68, 0.56, 0.7, 0.8]],
  [100, [1.2, 0.7, 0.32, 0.32, 0.3, 0.15, 0.8]],
  [220, [0.6, 0.33, 0.23, 0.17, 0.16, 0.09, 0.5]],
  [470, [0.24, 0.18, 0.12, 0.09, 0.09, 0.05, 0.3]],
  [1000, [0.12, 0.09, 0.08, 0.07, 0.05, 0.06, null]],
  // The table's large-capacitance rows, as printed: note 4,700 µF 10 V reads higher than 1,000 µF 10 V.
  [4700, [0.23, 0.2, 0.12, 0.08, 0.04, null, null]],
  [10000, [0.12, 0.08, 0.06, 0.04, null, null, null]],
];

/** Straight-line interpolation of log(y) against log(x) between two points. */
function logLog(x: number, x0: number, y0: number, x1: number, y1: number): number {
  const t = Math.log(x / x0) / Math.log(x1 / x0);
  return Math.exp(Math.log(y0) + t * Math.log(y1 / y0));
}

/** One voltage column at `microfarads`: log-log between the given rows, edge value (flagged) beyond them. */
function columnValue(column: number, microfarads: number): { ohms: number; extrapolated: boolean } {
  const points = ROWS.flatMap(([c, cells]) => {
    const ohms = cells[column];
    return ohms === null || ohms === undefined ? [] : [[c, ohms] as const];
  });
  const first = points[0];
  const last = points[points.length - 1];
  if (first === undefined || last === undefined) throw new Error('Table A column is empty');
  if (microfarads <= first[0]) return { ohms: first[1], extrapolated: microfarads < first[0] };
  if (microfarads >= last[0]) return { ohms: last[1], extrapolated: microfarads > last[0] };
  const upper = points.findIndex(([c]) => c >= microfarads);
  const [c1, r1] = points[upper] ?? last;
  if (c1 === microfarads) return { ohms: r1, extrapolated: false };
  const [c0, r0] = points[upper - 1] ?? first;
  return { ohms: logLog(microfarads, c0, r0, c1, r1), extrapolated: false };
}

/**
 * Expected maximum ESR (ohms, at ~100 kHz, 20 °C) of a healthy aluminium electrolytic of
 * `farads` capacitance and `ratedVolts` rated voltage, following Table A (technicians' table).
 * Between capacitance rows and between voltage columns it interpolates log-log; beyond the
 * table (below 1 µF, above the column's last row, below 10 V or above 250 V) it uses the edge
 * value and says so. Valve-set reservoirs (350–500 V) thus use the 250 V column, flagged.
 */
export function esrLimitDetail(farads: number, ratedVolts: number): EsrLimitDetail {
  requirePositive(farads, 'capacitance (F)');
  requirePositive(ratedVolts, 'rated voltage (V)');
  const microfarads = scaleByPowerOfTen(farads, 6);
  const lowest = VOLT_COLUMNS[0];
  const highest = VOLT_COLUMNS[VOLT_COLUMNS.length - 1] ?? lowest;
  const volts = Math.min(highest, Math.max(lowest, ratedVolts));
  const upper = VOLT_COLUMNS.findIndex((v) => v >= volts);
  const v1 = VOLT_COLUMNS[upper] ?? highest;
  const right = columnValue(upper, microfarads);
  let ohms = right.ohms;
  let extrapolated = right.extrapolated || volts !== ratedVolts;
  if (v1 !== volts) {
    const v0 = VOLT_COLUMNS[upper - 1] ?? lowest;
    const left = columnValue(upper - 1, microfarads);
    ohms = logLog(volts, v0, left.ohms, v1, right.ohms);
    extrapolated ||= left.extrapolated;
  }
  const notes = [
    'A guide, not a pass mark: be wary of a reading above double this; high-temperature types may read higher and still be good.',
  ];
  if (ratedVolts > highest)
    notes.push(`Table A stops at ${highest} V; the ${highest} V column is used for this ${ratedVolts} V part.`);
  if (extrapolated && ratedVolts <= highest) notes.push('Outside the table; the nearest edge value is used.');
  return { ohms, table: TABLE_NAME, testHertz: 100e3, extrapolated, note: notes.join(' ') };
}

/** Expected maximum ESR in ohms (~100 kHz) for a healthy electrolytic of `farads` (F) rated `ratedVolts` (V); see esrLimitDetail. */
export function esrLimit(farads: number, ratedVolts: number): number {
  return esrLimitDetail(farads, ratedVolts).ohms;
}

/** ESR in ohms implied by a dissipation factor tan δ (dimensionless) at `hertz` (Hz) for `farads` (F): tan δ / (2πfC). */
export function esrFromTanDelta(tanDelta: number, farads: number, hertz: number): number {
  requirePositive(tanDelta, 'dissipation factor tan δ');
  requirePositive(farads, 'capacitance (F)');
  requirePositive(hertz, 'frequency (Hz)');
  return tanDelta / (2 * Math.PI * hertz * farads);
}
