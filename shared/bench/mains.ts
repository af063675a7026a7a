import { requirePositive } from './bench-input-error';

/**
 * Secondary voltage in volts of an ideal transformer winding rated `ratedVolts` (V) on the
 * `tapVolts` (V) primary tap when fed `mainsVolts` (V). Ignores regulation, so real sets read a little different.
 */
export function tapScaled({
  ratedVolts,
  tapVolts,
  mainsVolts,
}: {
  ratedVolts: number;
  tapVolts: number;
  mainsVolts: number;
}): number {
  requirePositive(ratedVolts, 'rated winding voltage (V)');
  requirePositive(tapVolts, 'tap voltage (V)');
  requirePositive(mainsVolts, 'mains voltage (V)');
  return (ratedVolts * mainsVolts) / tapVolts;
}

export interface SeriesLampInput {
  /** Lamp rating, watts. */
  lampWatts: number;
  /** Lamp rated voltage, volts. */
  lampVolts: number;
  /** Mains voltage on the bench, volts. */
  mainsVolts: number;
}

export interface SeriesLampLimit {
  /** Most current the lamp lets through, amperes: the fault case, lamp alone across the mains. */
  maxAmps: number;
  /** Lamp resistance when fully lit, ohms: V²/P at its rating. */
  hotOhms: number;
  /** Rough resistance when cold, ohms: tungsten is about 1/15 of its hot value, hence the switch-on flash. */
  coldOhms: number;
  note: string;
}

// Tungsten cold resistance is about 1/15 of hot (encyclopedia article on the incandescent lamp: "about 1/15").
const COLD_TO_HOT = 1 / 15;

/** Current limit (A), hot and cold resistance (Ω) of a series ("dim-bulb") lamp of `lampWatts` (W) and `lampVolts` (V) on `mainsVolts` (V). */
export function seriesLampLimitDetail({ lampWatts, lampVolts, mainsVolts }: SeriesLampInput): SeriesLampLimit {
  requirePositive(lampWatts, 'lamp power (W)');
  requirePositive(lampVolts, 'lamp voltage (V)');
  requirePositive(mainsVolts, 'mains voltage (V)');
  const hotOhms = (lampVolts * lampVolts) / lampWatts;
  const notes = [
    'Uses the lamp\u2019s hot resistance; a lamp below full brightness is cooler and passes a little more per volt.',
  ];
  if (mainsVolts > lampVolts * 1.1) {
    notes.push(
      `The mains (${mainsVolts} V) is well above the lamp rating (${lampVolts} V): the lamp is overrun and may fail.`,
    );
  }
  return { maxAmps: mainsVolts / hotOhms, hotOhms, coldOhms: hotOhms * COLD_TO_HOT, note: notes.join(' ') };
}

/** The most current in amperes a series lamp of `lampWatts` (W), `lampVolts` (V) lets through on `mainsVolts` (V). */
export function seriesLampLimit(input: SeriesLampInput): number {
  return seriesLampLimitDetail(input).maxAmps;
}
