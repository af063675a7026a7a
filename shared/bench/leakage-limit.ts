import { requirePositive, scaleByPowerOfTen } from './bench-input-error';

/** A leakage limit with the rule behind it: the same part passes or fails by 5–10× depending on the rule. */
export interface LeakageLimitDetail {
  /** Maximum leakage current in amperes at rated voltage, 20 °C. */
  amps: number;
  /** The rule applied, in words. */
  rule: string;
  /** How long after applying rated voltage (seconds) the datasheet rule reads the current. */
  measureAfterSeconds: number;
  note: string;
}

/**
 * Maximum leakage (amperes) of a general-purpose aluminium electrolytic of `farads` (F) rated
 * `ratedVolts` (V), per the rule a general-purpose radial series datasheet states (C in µF, U in V, I in µA):
 * U ≤ 100 V: 0.01·C·U or 3 µA, whichever is greater (after 2 min);
 * U > 100 V: 0.03·C·U + 15 µA when C·U ≤ 1000, else 0.02·C·U + 25 µA (after 5 min).
 * Both are rated values, not the voltage applied on the bench.
 */
export function leakageLimitDetail(farads: number, ratedVolts: number): LeakageLimitDetail {
  requirePositive(farads, 'capacitance (F)');
  requirePositive(ratedVolts, 'rated voltage (V)');
  const cv = scaleByPowerOfTen(farads, 6) * ratedVolts;
  const note = 'Measured at rated voltage and 20 °C; leakage falls with time and roughly doubles to triples by 60 °C.';
  let microamps: number;
  let rule: string;
  let measureAfterSeconds: number;
  if (ratedVolts <= 100) {
    microamps = Math.max(0.01 * cv, 3);
    rule = 'general-purpose ≤100 V: 0.01·C·V or 3 µA';
    measureAfterSeconds = 120;
  } else if (cv <= 1000) {
    microamps = 0.03 * cv + 15;
    rule = 'high-voltage >100 V, C·V ≤ 1000: 0.03·C·V + 15 µA';
    measureAfterSeconds = 300;
  } else {
    microamps = 0.02 * cv + 25;
    rule = 'high-voltage >100 V, C·V > 1000: 0.02·C·V + 25 µA';
    measureAfterSeconds = 300;
  }
  return { amps: scaleByPowerOfTen(microamps, -6), rule, measureAfterSeconds, note };
}

/** Maximum leakage current in amperes for `farads` (F) rated `ratedVolts` (V); see leakageLimitDetail. */
export function leakageLimit(farads: number, ratedVolts: number): number {
  return leakageLimitDetail(farads, ratedVolts).amps;
}
