import { measurementVerdict } from '../../../../shared/bench';
import {
  measurementInputSchema,
  type LineUp,
  type Measurement,
  type MeasurementInput,
} from '../../../../shared/schemas/measurements';

/**
 * A stored reading as the API answers it: what was sent, with the API's own defaults for what was not (the shared
 * input schema), judged by the same bench library the server uses.
 */
export function makeMeasurement(
  id: number,
  sent: MeasurementInput & { findingId?: number | null },
  extra: Partial<Measurement> = {},
): Measurement {
  const input = measurementInputSchema.parse(sent);
  const v = measurementVerdict(input);
  return {
    id,
    restorationId: 7,
    findingId: input.findingId ?? null,
    location: input.location,
    quantity: input.quantity,
    expectedText: input.expected,
    toleranceText: input.tolerance,
    ratingText: input.rating,
    readingText: input.reading,
    conditions: input.conditions,
    method: input.method,
    chartMeterText: input.chartMeter,
    meterText: input.meter,
    sourceText: input.source,
    expected: v.expected,
    reading: v.reading,
    rating: v.rating,
    reference: v.reference,
    deviation: v.deviation,
    verdict: v.verdict,
    verdictReason: v.reason,
    ownerVisible: input.ownerVisible,
    powerOn: input.powerOn,
    measuredBy: 'Ada Bench',
    measuredAt: new Date(Date.UTC(2026, 2, 1, 10, id)).toISOString(),
    ...extra,
  };
}

/** A DC voltage point of a chart: location, expected, reading (tolerance ±10 %). */
export const volts = (id: number, location: string, expected: string, reading: string) =>
  makeMeasurement(id, { location, quantity: 'dc-voltage', expected, tolerance: '10', reading, method: 'DMM 10 MΩ' });

/** Five points of a voltage chart; V5 pin 7 reads far too high. */
export const fivePoints = () => [
  volts(1, 'V5 pin 7', '250 V', '320 V'),
  volts(2, 'V5 pin 9', '250 V', '255 V'),
  volts(3, 'V5 pin 3', '8.5 V', '8.3 V'),
  volts(4, 'V1 pin 6', '90 V', '92 V'),
  volts(5, 'V4 pin 1', '-2 V', '-2.1 V'),
];

export const seriesLineUp: LineUp = {
  valves: [
    { position: 'V1', type: 'UCH42', notes: '' },
    { position: 'V2', type: 'UL41', notes: 'tests weak' },
  ],
  liveChassis: { likely: true, reasons: ['UCH42: heater letter U is a series-string heater (100 mA)'] },
};
