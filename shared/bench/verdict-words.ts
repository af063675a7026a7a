import { formatQuantity } from './quantity-format';
import type { QuantityUnit } from './quantity-parse';
import { formatDifference, signedPercent } from '../format';

export { signedPercent };

/** How a reading is judged: under a maximum (ESR, leakage, earth continuity, ripple), over a minimum (insulation), or about a nominal value. */
export type LimitKind = 'maximum' | 'minimum' | 'nominal';

export interface DeviationInput {
  limit: LimitKind;
  /** Reading in SI units; for an over-range reading, the bound written, or null. */
  reading: number | null;
  /** The limit or expected value it was judged against, SI units; null when none. */
  reference: number | null;
  /** Signed fraction against the reference, as measurementVerdict gives it. */
  deviation: number | null;
  unit: QuantityUnit;
  overRange?: boolean;
  /** An absolute tolerance was used (frequency): show the difference in the unit, not per cent. */
  absolute?: boolean;
}

/**
 * The deviation in words that fit the kind of limit: "200 MΩ, above the 2 MΩ minimum", "0.9 Ω, above the 0.6 Ω maximum",
 * "+12.8 %" against a nominal, "+75 kHz" for an absolute tolerance; "over range" when the meter overflowed; "—" when nothing to compare.
 */
export function describeDeviation(d: DeviationInput): string {
  const show = (v: number) => formatQuantity(v, d.unit);
  const read = d.overRange
    ? d.reading === null
      ? 'over range'
      : `over range (above ${show(d.reading)})`
    : d.reading === null
      ? '—'
      : show(d.reading);
  if (d.reference === null) return d.overRange ? read : '—';
  if (d.limit === 'minimum') {
    const above = d.overRange || (d.reading ?? 0) >= d.reference;
    return `${read}, ${above ? 'above' : 'below'} the ${show(d.reference)} minimum`;
  }
  if (d.limit === 'maximum') {
    if (d.overRange) return `${read}, above the ${show(d.reference)} maximum`;
    const under = (d.reading ?? 0) <= d.reference;
    return `${read}, ${under ? 'within' : 'above'} the ${show(d.reference)} maximum`;
  }
  if (d.overRange) return read;
  if (d.deviation === null || d.reading === null) return '—';
  if (d.absolute) {
    return formatDifference(d.reading - d.reference, d.unit);
  }
  return signedPercent(d.deviation);
}
