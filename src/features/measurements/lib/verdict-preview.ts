import { applicableTexts, BenchInputError, measurementVerdict } from '../../../../shared/bench';
import type { MeasuredQuantity, MeasurementVerdict } from '../../../../shared/bench';

/** The form's fields a message can be about. */
export type ReadingField =
  | 'location'
  | 'quantity'
  | 'expected'
  | 'tolerance'
  | 'rating'
  | 'reading'
  | 'conditions'
  | 'method'
  | 'findingId'
  | 'chartMeter'
  | 'meter'
  | 'source';

export interface ReadingTexts {
  quantity: MeasuredQuantity;
  expected: string;
  tolerance: string;
  rating: string;
  reading: string;
  /** Voltages only: the chart's meter, yours, and the point's source resistance (all three, or the chart's figure stands). */
  chartMeter?: string;
  meter?: string;
  source?: string;
}

export type Preview =
  | { status: 'waiting' }
  | { status: 'ready'; verdict: MeasurementVerdict }
  | { status: 'refused'; field?: ReadingField; message: string };

// Bench-library messages start with the field's name in words; the API's validation messages with its key.
const PREFIXES: Record<string, ReadingField> = {
  reading: 'reading',
  'expected value': 'expected',
  expected: 'expected',
  rating: 'rating',
  tolerance: 'tolerance',
  location: 'location',
  quantity: 'quantity',
  conditions: 'conditions',
  method: 'method',
  findingid: 'findingId',
  "chart's meter": 'chartMeter',
  'chart’s meter': 'chartMeter',
  chartmeter: 'chartMeter',
  'your meter': 'meter',
  meter: 'meter',
  'source resistance': 'source',
  source: 'source',
};

/** Which field a message from the bench library or the API is about, if it says. */
export function fieldOfMessage(message: string): ReadingField | undefined {
  const prefix = /^([A-Za-z '’]+):/.exec(message)?.[1]?.trim().toLowerCase();
  if (prefix !== undefined && prefix in PREFIXES) return PREFIXES[prefix];
  if (/expected value/i.test(message)) return 'expected';
  if (/tolerance|below what is expected/i.test(message)) return 'tolerance';
  return undefined;
}

/** The verdict the server will store, worked out as the person types; waits for a reading. */
export function previewVerdict(texts: ReadingTexts): Preview {
  const t = applicableTexts(texts);
  if (t.reading.trim() === '') return { status: 'waiting' };
  try {
    return { status: 'ready', verdict: measurementVerdict(t) };
  } catch (error) {
    if (!(error instanceof BenchInputError)) throw error;
    return { status: 'refused', field: fieldOfMessage(error.message), message: error.message };
  }
}
