import { parseTolerance } from '../../../../shared/bench';
import type { MeasuredQuantity } from '../../../../shared/bench';
import type { Measurement } from '../../../../shared/schemas/measurements';

const MINUS = '\u2212';
const percent = (fraction: number) => String(Number((fraction * 100).toPrecision(3)));

/** A signed fraction as per cent to one decimal: 0.06 → "+6.0 %", −0.2 → "−20.0 %"; null → "—". */
export function formatDeviation(fraction: number | null): string {
  if (fraction === null || !Number.isFinite(fraction)) return '—';
  const size = Math.abs(fraction * 100).toFixed(1);
  return `${fraction > 0 ? '+' : fraction < 0 ? MINUS : ''}${size} %`;
}

/** A typed tolerance in words: "10" → "±10 %", "-20/+50" → "−20/+50 %"; what cannot be read is shown as typed. */
export function formatTolerance(text: string): string {
  if (text.trim() === '') return '';
  try {
    const t = parseTolerance(text);
    return typeof t === 'number' ? `±${percent(t)} %` : `${MINUS}${percent(t.minus)}/+${percent(t.plus)} %`;
  } catch {
    return text;
  }
}

/** Judged against a limit (a maximum or a minimum) rather than a value with a tolerance. */
export const judgedByLimit = (quantity: MeasuredQuantity) => quantity === 'esr' || quantity === 'leakage' || quantity === 'insulation';

/** The expected side of a reading as the manual gives it: value, tolerance and rating where they apply. */
export function expectedSummary(m: Pick<Measurement, 'quantity' | 'expectedText' | 'toleranceText' | 'ratingText'>): string {
  if (m.quantity === 'esr' || m.quantity === 'leakage')
    return [m.expectedText, m.ratingText].filter((t) => t.trim() !== '').join(' ') || '—';
  if (m.quantity === 'insulation') return m.expectedText ? `min ${m.expectedText}` : 'min 1 MΩ';
  if (m.expectedText.trim() === '') return '—';
  return [m.expectedText, m.toleranceText.trim() ? formatTolerance(m.toleranceText) : '±20 % (usual)'].join(' ');
}

/** Date and time a reading was taken, in the reader's own format. */
export function formatWhen(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : date.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}
