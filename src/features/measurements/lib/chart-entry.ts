import type { MeasurementInput } from '../../../../shared/schemas/measurements';
import { previewVerdict, type Preview } from './verdict-preview';

/** One row of the voltage-chart entry: a point as the person types it, and what the server said of it. */
export interface EntryRow {
  key: number;
  location: string;
  expected: string;
  tolerance: string;
  reading: string;
  /** The server's refusal, in its words. */
  error?: string;
}

/** What every row of one chart shares: the kind of voltage, the conditions and the meter. */
export interface EntryShared {
  quantity: 'dc-voltage' | 'ac-voltage';
  conditions: string;
  method: string;
  ownerVisible: boolean;
}

export const blankRow = (key: number): EntryRow => ({ key, location: '', expected: '', tolerance: '', reading: '' });

export const isBlankRow = (row: EntryRow) => [row.location, row.expected, row.tolerance, row.reading].every((t) => t.trim() === '');

/** The live verdict for a row, as the form shows it. */
export const rowPreview = (row: EntryRow, quantity: EntryShared['quantity']): Preview =>
  previewVerdict({ quantity, expected: row.expected, tolerance: row.tolerance, rating: '', reading: row.reading });

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
  ownerVisible: shared.ownerVisible,
  // A voltage chart is read on a powered set: it goes through the first-power gate.
  powerOn: true,
});
