import { DEFAULT_TOLERANCE, limitOf, outHeadings, parseTolerance, type LimitKind } from '../../../../shared/bench';
import type { Measurement } from '../../../../shared/schemas/measurements';
import { formatTolerance } from './measurement-format';
import { formatSignedQuantity } from '../../../lib/format';
import { naturalCompare } from '../../../../shared/natural-order';

type Verdict = Measurement['verdict'];

/** One point of the voltage chart: the latest reading at a location, against the manual. */
export interface VoltagePoint {
  id: number;
  location: string;
  /** The valve or part the point belongs to ("V5" for "V5 pin 7"), for grouping. */
  group: string;
  /** Location, with "(AC)" for AC readings so both kinds at one pin stay apart. */
  label: string;
  quantity: 'dc-voltage' | 'ac-voltage';
  expectedText: string;
  readingText: string;
  /** Volts, as the server parsed them. */
  expected: number | null;
  reading: number;
  /** The tolerance band in words, e.g. "±10 %" or "±20 % (usual)". */
  band: string;
  /** Per cent of the expected value the band allows below and above (negative, positive). */
  bandPct: [number, number] | null;
  /** Per cent the reading lies from the expected value; null when there is nothing to compare with. */
  deviationPct: number | null;
  verdict: Verdict;
  reason: string;
  /** What the point is judged against: a band about the expected value, or a limit ("max"/"min" typed as the tolerance). */
  limit: LimitKind;
}

const isVoltage = (m: Measurement): m is Measurement & { quantity: VoltagePoint['quantity'] } =>
  m.quantity === 'dc-voltage' || m.quantity === 'ac-voltage';

/** "V5 pin 7" → "V5"; a location without a part reference stands as its own group. */
export function groupOf(location: string): string {
  return /^([A-Za-z]{1,3}\d+[a-z]?)\b/.exec(location.trim())?.[1]?.toUpperCase() ?? location.trim();
}

function bandOf(m: Measurement, limit: LimitKind): Pick<VoltagePoint, 'band' | 'bandPct'> {
  if (m.expected === null) return { band: '', bandPct: null };
  // "max"/"min" typed as the tolerance: a limit, passed or failed, with no band about the expected value.
  if (limit === 'maximum') return { band: 'maximum', bandPct: null };
  if (limit === 'minimum') return { band: 'minimum', bandPct: null };
  let t: ReturnType<typeof parseTolerance> = DEFAULT_TOLERANCE;
  try {
    if (m.toleranceText.trim()) t = parseTolerance(m.toleranceText);
  } catch {
    // The server refused what it could not read, so this is stored text from an older rule: fall back to the usual band.
  }
  const { minus, plus } = typeof t === 'number' ? { minus: t, plus: t } : t;
  const band = m.toleranceText.trim() ? formatTolerance(m.toleranceText) : `±${DEFAULT_TOLERANCE * 100} % (usual)`;
  return { band, bandPct: [-minus * 100, plus * 100] };
}

const byLocation = (a: VoltagePoint, b: VoltagePoint) =>
  naturalCompare(a.group, b.group) || naturalCompare(a.label, b.label);

/** The voltage readings as chart points: the latest at each location (and kind), in valve then pin order. */
export function voltagePoints(measurements: readonly Measurement[]): VoltagePoint[] {
  const latest = new Map<string, Measurement & { quantity: VoltagePoint['quantity'] }>();
  for (const m of measurements.filter(isVoltage)) {
    const key = `${m.location.trim().toLowerCase()}|${m.quantity}`;
    const seen = latest.get(key);
    if (!seen || m.measuredAt >= seen.measuredAt) latest.set(key, m);
  }
  return [...latest.values()]
    .map((m) => ({ m, limit: limitOf(m.quantity, m.toleranceText) }))
    .map(({ m, limit }) => ({
      id: m.id,
      location: m.location,
      group: groupOf(m.location),
      quantity: m.quantity,
      label: m.quantity === 'ac-voltage' ? `${m.location} (AC)` : m.location,
      expectedText: m.expectedText,
      readingText: m.readingText,
      expected: m.expected,
      reading: m.reading,
      ...bandOf(m, limit),
      deviationPct: m.deviation === null ? null : m.deviation * 100,
      verdict: m.verdict,
      reason: m.verdictReason,
      limit,
    }))
    .sort(byLocation);
}

/** Points by the valve or part they belong to, in order. */
export function groupPoints(points: readonly VoltagePoint[]): { group: string; points: VoltagePoint[] }[] {
  const groups = new Map<string, VoltagePoint[]>();
  for (const p of points) groups.set(p.group, [...(groups.get(p.group) ?? []), p]);
  return [...groups].map(([group, list]) => ({ group, points: list }));
}

/** Half-width of the plot's axis in per cent: room for every band's marginal zone and reading, capped at ±100 %. */
export function plotLimit(points: readonly VoltagePoint[]): number {
  const reach = points.flatMap((p) => [
    ...(p.bandPct ? p.bandPct.map((b) => Math.abs(b) * 1.5) : []),
    p.deviationPct === null ? 0 : Math.abs(p.deviationPct),
  ]);
  const widest = Math.max(10, ...reach) * 1.1;
  return Math.min(100, Math.ceil(widest / 10) * 10);
}

/** Volts with an SI prefix and a true minus sign: −2.1 V, 1.2 kV; "—" for none. */
export const voltsText = (v: number | null) => (v === null ? '—' : formatSignedQuantity(v, 'V'));

/** One point in words, e.g. "V5 pin 7 reads 310 V against 255 V ±10 %". */
export function describePoint(p: VoltagePoint): string {
  if (p.expected === null) return `${p.label} reads ${voltsText(p.reading)}, no expected value`;
  if (p.limit === 'maximum' || p.limit === 'minimum')
    return `${p.label} reads ${voltsText(p.reading)} against a ${p.limit} of ${voltsText(p.expected)}`;
  return `${p.label} reads ${voltsText(p.reading)} against ${voltsText(p.expected)} ${p.band}`;
}

/** The plot in words, for those who cannot see it: counts by verdict, then each point that is not within. */
export function plotSummary(points: readonly VoltagePoint[]): string {
  const count = (v: Verdict) => points.filter((p) => p.verdict === v).length;
  const counts = (['within', 'marginal', 'out', 'unknown'] as const)
    .filter((v) => count(v) > 0)
    .map((v) => `${count(v)} ${v}`)
    .join(', ');
  const head = `Voltage chart, ${points.length} ${points.length === 1 ? 'point' : 'points'}: ${counts}.`;
  const out = points.filter((p) => p.verdict === 'out');
  const marginal = points.filter((p) => p.verdict === 'marginal');
  // Each point out is named under what it broke, in the history's words: out of tolerance, over or under its limit.
  const limits = (Object.keys(outHeadings) as LimitKind[]).filter((l) => points.some((p) => p.limit === l));
  const outUnder = limits
    .map((l) => ({ heading: outHeadings[l], list: out.filter((p) => p.limit === l) }))
    .filter(({ list }) => list.length > 0);
  const none = limits.map((l) => outHeadings[l].toLowerCase()).join(' or ') || 'out of tolerance';
  const parts = [
    head,
    ...(out.length
      ? outUnder.map(({ heading, list }) => `${heading}: ${list.map(describePoint).join('; ')}.`)
      : [`None ${none}.`]),
  ];
  if (marginal.length) parts.push(`Marginal: ${marginal.map(describePoint).join('; ')}.`);
  return parts.join(' ');
}
