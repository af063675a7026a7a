import { BenchInputError, requireNonNegative, requirePositive } from './bench-input-error';
import { valveType } from './valve-type';

export interface RatingCheck {
  /** What is dissipated (or drawn), in watts or amperes. */
  value: number;
  /** The rating it is judged against, same unit; undefined when Gridleak has none for the type. */
  rating?: number;
  /** value ÷ rating. */
  fraction?: number;
  /** 'within' up to the rating, 'marginal' up to 1.1 × (read again, allow for the meter), 'out' beyond. */
  verdict: 'within' | 'marginal' | 'out' | 'unknown';
}

const judge = (value: number, rating?: number): RatingCheck => {
  if (rating === undefined) return { value, verdict: 'unknown' };
  const fraction = value / rating;
  // Forgive float noise at exactly the rating (250 V × 48 mA is 12.000000000000002 W).
  return {
    value,
    rating,
    fraction,
    verdict: fraction <= 1 + 1e-9 ? 'within' : fraction <= 1.1 + 1e-9 ? 'marginal' : 'out',
  };
};

/** A resistor's dissipation in watts from two of volts across it, current through it and its resistance: V²/R, I²R or V·I. */
export function resistorDissipation(input: {
  ohms?: number;
  volts?: number;
  amps?: number;
  ratingWatts?: number;
}): RatingCheck {
  const { ohms, volts, amps, ratingWatts } = input;
  let watts: number;
  if (volts !== undefined && ohms !== undefined) watts = (volts * volts) / requirePositive(ohms, 'resistance (Ω)');
  else if (amps !== undefined && ohms !== undefined) watts = amps * amps * requirePositive(ohms, 'resistance (Ω)');
  else if (volts !== undefined && amps !== undefined) watts = Math.abs(volts * amps);
  else throw new BenchInputError('Give two of: the resistance, the volts across it, the current through it.');
  return judge(watts, ratingWatts === undefined ? undefined : requirePositive(ratingWatts, 'power rating (W)'));
}

/** Anode dissipation Pa = Va·Ia (watts) against the valve's maximum where Gridleak's table has it (or as given). */
export function anodeDissipation(input: {
  anodeVolts: number;
  anodeAmps: number;
  valve?: string;
  maxWatts?: number;
}): RatingCheck & { source?: string } {
  requireNonNegative(input.anodeVolts, 'anode voltage (V)');
  requireNonNegative(input.anodeAmps, 'anode current (A)');
  const data = input.valve ? valveType(input.valve).data : undefined;
  const max = input.maxWatts ?? data?.typical?.maxAnodeWatts;
  const check = judge(input.anodeVolts * input.anodeAmps, max);
  return input.maxWatts === undefined && data && max !== undefined ? { ...check, source: data.source } : check;
}

/** A rectifier's DC load current (amperes) against its maximum where Gridleak's table has it (or as given). */
export function rectifierLoad(input: {
  dcAmps: number;
  valve?: string;
  maxAmps?: number;
}): RatingCheck & { source?: string } {
  requireNonNegative(input.dcAmps, 'DC load current (A)');
  const data = input.valve ? valveType(input.valve).data : undefined;
  const max = input.maxAmps ?? data?.typical?.maxDcAmps;
  const check = judge(input.dcAmps, max);
  return input.maxAmps === undefined && data && max !== undefined ? { ...check, source: data.source } : check;
}
