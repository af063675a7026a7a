import type { MeasuredQuantity } from '../../../../shared/bench';

/** How the reading form reads for one kind of measurement: labels, which fields apply, what to note. */
export interface QuantityFields {
  expectedLabel: string;
  expectedPlaceholder: string;
  /** ESR, leakage and insulation follow their own limits, so a tolerance means nothing there. */
  showTolerance: boolean;
  /** The rated voltage: the ESR and leakage limits depend on it. */
  showRating: boolean;
  readingPlaceholder: string;
  methodHint: string;
  /** Taken on a powered set (or with a test voltage applied): the live-readings caution applies. */
  live: boolean;
}

const manual = { expectedLabel: 'Expected (manual)', showTolerance: true, showRating: false };

export const quantityFields: Record<MeasuredQuantity, QuantityFields> = {
  esr: {
    expectedLabel: 'Nominal capacitance', expectedPlaceholder: 'e.g. 32µ', showTolerance: false, showRating: true,
    readingPlaceholder: 'e.g. 1.2 Ω', methodHint: 'Test frequency, e.g. 100 kHz', live: false,
  },
  capacitance: {
    ...manual, expectedPlaceholder: 'e.g. 25µ, 22n, 220p', readingPlaceholder: 'e.g. 23.1 nF',
    methodHint: 'Meter and test frequency, e.g. LCR meter at 1 kHz; in or out of circuit', live: false,
  },
  leakage: {
    expectedLabel: 'Nominal capacitance', expectedPlaceholder: 'e.g. 32µ', showTolerance: false, showRating: true,
    readingPlaceholder: 'e.g. 85 µA', methodHint: 'Time at rated voltage, e.g. 5 min', live: true,
  },
  resistance: {
    ...manual, expectedPlaceholder: 'e.g. 470k', readingPlaceholder: 'e.g. 1.3M',
    methodHint: 'Meter and range; in or out of circuit, set unplugged', live: false,
  },
  'dc-voltage': {
    ...manual, expectedPlaceholder: 'e.g. 255 V', readingPlaceholder: 'e.g. 263 V',
    methodHint: 'Meter and its Ω/V, e.g. DMM 10 MΩ or 20 kΩ/V', live: true,
  },
  'ac-voltage': {
    ...manual, expectedPlaceholder: 'e.g. 6.3 V', readingPlaceholder: 'e.g. 6.2 V',
    methodHint: 'Meter and its Ω/V, e.g. DMM 10 MΩ or 20 kΩ/V', live: true,
  },
  current: {
    ...manual, expectedPlaceholder: 'e.g. 52 mA', readingPlaceholder: 'e.g. 57 mA',
    methodHint: 'Meter and how: in series, or from the volts across a known resistor', live: true,
  },
  insulation: {
    expectedLabel: 'Minimum', expectedPlaceholder: 'blank for 1 MΩ', showTolerance: false, showRating: false,
    readingPlaceholder: 'e.g. 180 MΩ', methodHint: 'Test voltage and between what, e.g. 500 V DC, mains pins to chassis', live: true,
  },
  frequency: {
    ...manual, expectedPlaceholder: 'e.g. 472 kHz', readingPlaceholder: 'e.g. 471.2 kHz',
    methodHint: 'Instrument and where it was coupled, e.g. counter via 10 pF at the oscillator', live: true,
  },
};
