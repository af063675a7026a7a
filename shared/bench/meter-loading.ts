import { requireFinite, requireNonNegative, requirePositive } from './bench-input-error';

/** An analogue meter by its sensitivity and the range used, or a meter with a fixed input resistance (a DMM's 10 MΩ). */
export type MeterSpec = { ohmsPerVolt: number; rangeVolts: number } | { inputOhms: number };

/**
 * A voltmeter's own resistance in ohms: ohms-per-volt × the range's full-scale volts for a moving-coil meter
 * (1,000 Ω/V on the 1,000 V range is 1 MΩ), or the input resistance of an electronic meter as given.
 */
export function meterOhms(meter: MeterSpec): number {
  if ('inputOhms' in meter) return requirePositive(meter.inputOhms, 'meter input resistance (Ω)');
  requirePositive(meter.ohmsPerVolt, 'meter sensitivity (Ω/V)');
  requirePositive(meter.rangeVolts, 'meter range (V)');
  return meter.ohmsPerVolt * meter.rangeVolts;
}

/**
 * What a meter of `meterOhms` (Ω) reads across a point whose unloaded (open-circuit) voltage is `openCircuitVolts` (V)
 * behind `sourceOhms` (Ω, the Thévenin resistance there: an anode load, a dropper): V·Rm/(Rs + Rm).
 */
export function loadedReading({
  openCircuitVolts,
  sourceOhms,
  meterOhms: rm,
}: {
  openCircuitVolts: number;
  sourceOhms: number;
  meterOhms: number;
}): number {
  requireFinite(openCircuitVolts, 'open-circuit voltage (V)');
  requireNonNegative(sourceOhms, 'source resistance (Ω)');
  requirePositive(rm, 'meter resistance (Ω)');
  return (openCircuitVolts * rm) / (sourceOhms + rm);
}

export interface MeterCorrection {
  /** The voltage there with no meter at all, volts. */
  openCircuitVolts: number;
  /** What your meter should read where the chart's meter read the chart's value, volts. */
  expectedOnYourMeter: number;
  /** expectedOnYourMeter ÷ chartVolts − 1: how much higher (positive) your meter reads than the chart's. */
  difference: number;
  chartMeterOhms: number;
  yourMeterOhms: number;
  /** The correction in words. */
  words: string;
}

const describeMeter = (m: MeterSpec) =>
  'inputOhms' in m
    ? `${+(m.inputOhms / 1e6).toPrecision(3)} MΩ-input meter`
    : `${+(m.ohmsPerVolt / 1000).toPrecision(3)} kΩ/V meter`;

/**
 * Turns a service chart's voltage, read with the chart's meter, into what your meter should read at the same point:
 * the chart's reading is un-loaded through the source resistance to the open-circuit voltage, then loaded again by your meter.
 */
export function meterCorrection(input: {
  chartVolts: number;
  sourceOhms: number;
  chartMeter: MeterSpec;
  yourMeter: MeterSpec;
}): MeterCorrection {
  requireFinite(input.chartVolts, 'chart voltage (V)');
  const rs = requireNonNegative(input.sourceOhms, 'source resistance (Ω)');
  const chartMeterOhms = meterOhms(input.chartMeter);
  const yourMeterOhms = meterOhms(input.yourMeter);
  const openCircuitVolts = (input.chartVolts * (rs + chartMeterOhms)) / chartMeterOhms;
  const expectedOnYourMeter = loadedReading({ openCircuitVolts, sourceOhms: rs, meterOhms: yourMeterOhms });
  const difference = input.chartVolts === 0 ? 0 : expectedOnYourMeter / input.chartVolts - 1;
  const size = Math.round(Math.abs(difference) * 100);
  const direction = difference >= 0 ? 'higher' : 'lower';
  const words =
    size === 0
      ? `A ${describeMeter(input.yourMeter)} here reads within 1 % of the manual's ${describeMeter(input.chartMeter)}.`
      : `A ${describeMeter(input.yourMeter)} here reads about ${size} % ${direction} than the manual's ${describeMeter(input.chartMeter)}.`;
  return { openCircuitVolts, expectedOnYourMeter, difference, chartMeterOhms, yourMeterOhms, words };
}
