import { seriesLampLimitDetail, tapScaled } from '../../../../shared/bench';
import { formatSignedFixed } from '../../../lib/format';

const round = (value: number, places: number) => value.toFixed(places);

/**
 * The series lamp's most current at the volts applied (the fault case: the lamp alone across the supply),
 * in words for the step form; null until the lamp's rating and the volts are known.
 */
export function lampLimitWords(lamp: {
  lampWatts: number | null;
  lampVolts: number | null;
  appliedVolts: number | null;
}): { limit: string; note: string } | null {
  const { lampWatts, lampVolts, appliedVolts } = lamp;
  if (!lampWatts || !lampVolts || !appliedVolts || lampWatts <= 0 || lampVolts <= 0 || appliedVolts <= 0) return null;
  const d = seriesLampLimitDetail({ lampWatts, lampVolts, mainsVolts: appliedVolts });
  return {
    limit: `This ${lampWatts} W lamp passes at most ${round(d.maxAmps, 2)} A at ${appliedVolts} V, even with a dead short in the set.`,
    note: d.note,
  };
}

/** What a winding rated `ratedVolts` on the `tapVolts` tap gives on `mainsVolts` mains, in words; null until all three are known. */
export function tapWords(t: {
  ratedVolts: number | null;
  tapVolts: number | null;
  mainsVolts: number | null;
}): string | null {
  const { ratedVolts, tapVolts, mainsVolts } = t;
  if (!ratedVolts || !tapVolts || !mainsVolts || ratedVolts <= 0 || tapVolts <= 0 || mainsVolts <= 0) return null;
  const volts = tapScaled({ ratedVolts, tapVolts, mainsVolts });
  const change = (volts / ratedVolts - 1) * 100;
  const direction = Math.abs(change) < 0.5 ? 'as rated' : `${formatSignedFixed(change, 1)} %`;
  return `A ${ratedVolts} V winding gives about ${round(volts, 2)} V on the ${tapVolts} V tap at ${mainsVolts} V mains (${direction}).`;
}
