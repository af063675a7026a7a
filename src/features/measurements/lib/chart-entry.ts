import type { MeasurementInput } from '../../../../shared/schemas/measurements';
import { previewVerdict, type Preview } from './verdict-preview';

/** One row of the voltage-chart entry: a point as the person types it, and what the server said of it. */
export interface EntryRow {
  key: number;
  location: string;
  expected: string;
  tolerance: string;
  reading: string;
  /** The resistance feeding the point (an anode load), for judging against the chart's meter; optional. */
  source: string;
  /** The server's refusal, in its words. */
  error?: string;
}

/** What every row of one chart shares: the kind of voltage, the conditions and the meter. */
export interface EntryShared {
  quantity: 'dc-voltage' | 'ac-voltage';
  conditions: string;
  method: string;
  /** The meter the service chart was taken with ("1k/V 250 V") and the one used now ("10 MΩ"); both optional. */
  chartMeter: string;
  meter: string;
  ownerVisible: boolean;
}

export const blankShared: EntryShared = {
  quantity: 'dc-voltage',
  conditions: '',
  method: '',
  chartMeter: '',
  meter: '',
  ownerVisible: false,
};

export const blankRow = (key: number): EntryRow => ({
  key,
  location: '',
  expected: '',
  tolerance: '',
  reading: '',
  source: '',
});

export const isBlankRow = (row: EntryRow) =>
  [row.location, row.expected, row.tolerance, row.reading, row.source].every((t) => t.trim() === '');

/**
 * The live verdict for a row, as the form shows it. With the chart's meter, yours and the row's source resistance,
 * the reading is judged against what your meter should read there (the bench library's meter loading).
 */
export const rowPreview = (
  row: EntryRow,
  quantity: EntryShared['quantity'],
  meters: Pick<EntryShared, 'chartMeter' | 'meter'> = { chartMeter: '', meter: '' },
): Preview =>
  previewVerdict({
    quantity,
    expected: row.expected,
    tolerance: row.tolerance,
    rating: '',
    reading: row.reading,
    chartMeter: meters.chartMeter,
    meter: meters.meter,
    source: row.source,
  });

/** What is missing before a row can be sent, in words; undefined when it can go. */
export function rowProblem(row: EntryRow): string | undefined {
  if (row.location.trim() === '') return 'Say where: e.g. V5 pin 3.';
  if (row.reading.trim() === '') return 'Enter the reading.';
  return undefined;
}

export const rowInput = (row: EntryRow, shared: EntryShared): MeasurementInput => ({
  location: row.location.trim(),
  quantity: shared.quantity,
  expected: row.expected.trim(),
  tolerance: row.tolerance.trim(),
  rating: '',
  reading: row.reading.trim(),
  conditions: shared.conditions.trim(),
  method: shared.method.trim(),
  chartMeter: shared.chartMeter.trim(),
  meter: shared.meter.trim(),
  source: row.source.trim(),
  ownerVisible: shared.ownerVisible,
  // A voltage chart is read on a powered set: it goes through the first-power gate.
  powerOn: true,
});
