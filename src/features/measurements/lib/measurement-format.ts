import {
  absoluteTolerance,
  describeDeviation,
  formatQuantity,
  isOverRange,
  limitOf,
  parseTolerance,
  readingKinds,
} from '../../../../shared/bench';
import type { Measurement } from '../../../../shared/schemas/measurements';
import { formatDateTime, formatDeviation, formatTolerance as formatToleranceBand } from '../../../lib/format';

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
export function deviationWords(
  m: Pick<Measurement, 'quantity' | 'toleranceText' | 'readingText' | 'reading' | 'reference' | 'deviation'>,
): string {
  const overRange = isOverRange(m.readingText);
  return describeDeviation({
    limit: limitOf(m.quantity, m.toleranceText),
    reading: overRange && /^\s*(?:O\.?L|over|∞)/i.test(m.readingText) ? null : m.reading,
    reference: m.reference,
    deviation: m.deviation,
    unit: readingKinds[m.quantity].unit,
    overRange,
    absolute: absoluteTolerance(m.quantity, m.toleranceText),
  });
}

/** The expected side of a reading as the manual gives it: value, tolerance and rating where its kind's rule uses them. */
export function expectedSummary(
  m: Pick<Measurement, 'quantity' | 'expectedText' | 'toleranceText' | 'ratingText'> & { expected?: number | null },
): string {
  const rule = readingKinds[m.quantity].rule;
  if (rule.type === 'capacitor-limit')
    return [m.expectedText, m.ratingText].filter((t) => t.trim() !== '').join(' ') || '—';
  const limit = limitOf(m.quantity, m.toleranceText);
  const word = limit === 'maximum' ? 'max' : 'min';
  if (rule.type !== 'band' && rule.default && m.expectedText.trim() === '')
    return `${word} ${formatQuantity(rule.default.value, readingKinds[m.quantity].unit)}`;
  if (m.expectedText.trim() === '') return '—';
  if (limit !== 'nominal') return `${word} ${m.expectedText}`;
  if (rule.type !== 'band') return m.expectedText;
  if (m.toleranceText.trim()) return [m.expectedText, formatTolerance(m.toleranceText)].join(' ');
  return [m.expectedText, rule.usual(m.expected ?? null).label].join(' ');
}

/** Date and time a reading was taken, in the reader's own format; the text as stored when it cannot be read. */
export const formatWhen = (iso: string): string => formatDateTime(iso) || iso;
