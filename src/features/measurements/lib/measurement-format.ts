import { absoluteTolerance, describeDeviation, formatQuantity, frequencyTolerance, isOverRange, limitOf, parseTolerance, quantityUnits } from '../../../../shared/bench';
import type { MeasuredQuantity } from '../../../../shared/bench';
import type { Measurement } from '../../../../shared/schemas/measurements';
import { formatDateTime, formatDeviation, formatTolerance as formatToleranceBand, MINUS } from '../../../lib/format';

// The bench library treats a capacitance of 1 µF and more as an electrolytic when no tolerance is typed.
const DEFAULT_ELECTROLYTIC_SIZE = 1e-6;

export { formatDeviation };

/** A typed tolerance in words: "10" → "±10 %", "-20/+50" → "−20/+50 %", "K" → "±10 %"; "max"/"min" and what cannot be read are shown as typed. */
export function formatTolerance(text: string): string {
  if (text.trim() === '') return '';
  try {
    return formatToleranceBand(parseTolerance(text));
  } catch {
    return text;
  }
}

/**
 * A stored reading's deviation in words that fit its limit: "200 MΩ, above the 2 MΩ minimum" for insulation, "1.1 Ω, above
 * the 800 mΩ maximum" for ESR, "−75 kHz" for an IF, "+12.8 %" against a nominal value, "over range" when the meter overflowed.
 */
export function deviationWords(m: Pick<Measurement, 'quantity' | 'toleranceText' | 'readingText' | 'reading' | 'reference' | 'deviation'>): string {
  const overRange = isOverRange(m.readingText);
  return describeDeviation({
    limit: limitOf(m.quantity, m.toleranceText), reading: overRange && /^\s*(?:O\.?L|over|∞)/i.test(m.readingText) ? null : m.reading,
    reference: m.reference, deviation: m.deviation, unit: quantityUnits[m.quantity], overRange, absolute: absoluteTolerance(m.quantity, m.toleranceText),
  });
}

/** The band the bench library applies when none is typed: electrolytic S band, an IF's kHz, ±20 % otherwise. */
function usualBand(quantity: MeasuredQuantity, expected: number | null): string {
  if (quantity === 'capacitance' && expected !== null && expected >= DEFAULT_ELECTROLYTIC_SIZE) return `${MINUS}20/+50 % (electrolytic)`;
  if (quantity === 'frequency' && expected !== null) return `±${formatQuantity(frequencyTolerance(expected), 'Hz')} (usual)`;
  return '±20 % (usual)';
}

/** The expected side of a reading as the manual gives it: value, tolerance and rating where they apply. */
export function expectedSummary(m: Pick<Measurement, 'quantity' | 'expectedText' | 'toleranceText' | 'ratingText'> & { expected?: number | null }): string {
  if (m.quantity === 'esr' || m.quantity === 'leakage')
    return [m.expectedText, m.ratingText].filter((t) => t.trim() !== '').join(' ') || '—';
  if (m.quantity === 'insulation') return m.expectedText ? `min ${m.expectedText}` : 'min 1 MΩ';
  if (m.expectedText.trim() === '') return '—';
  const limit = limitOf(m.quantity, m.toleranceText);
  if (limit !== 'nominal') return `${limit === 'maximum' ? 'max' : 'min'} ${m.expectedText}`;
  if (m.toleranceText.trim()) return [m.expectedText, formatTolerance(m.toleranceText)].join(' ');
  return [m.expectedText, usualBand(m.quantity, m.expected ?? null)].join(' ');
}

/** Date and time a reading was taken, in the reader's own format; the text as stored when it cannot be read. */
export const formatWhen = (iso: string): string => formatDateTime(iso) || iso;
