import type { Measurement, MeasurementInput } from '../../../../shared/schemas/measurements';

/** A stored reading back as what was typed: the texts the server kept, to fill the form or to send again. */
export const inputOf = (m: Measurement): MeasurementInput & { findingId: number | null } => ({
  location: m.location,
  quantity: m.quantity,
  expected: m.expectedText,
  tolerance: m.toleranceText,
  rating: m.ratingText,
  reading: m.readingText,
  conditions: m.conditions,
  method: m.method,
  chartMeter: m.chartMeterText,
  meter: m.meterText,
  source: m.sourceText,
  findingId: m.findingId,
  ownerVisible: m.ownerVisible,
  powerOn: m.powerOn,
});
