import { formatQuantity } from '../../../../shared/bench';
import type { QuantityUnit } from '../../../../shared/bench';

const MINUS = '\u2212';

function signed(text: string, positive: boolean): string {
  if (text.startsWith('-')) return `${MINUS}${text.slice(1)}`;
  return positive ? `+${text}` : text;
}

/** A fraction as per cent to three figures: 0.05 → "5 %"; with `sign`, 0.06 → "+6 %" and −0.1 → "−10 %". */
export function formatPercent(fraction: number, sign = false): string {
  const percent = Number((fraction * 100).toPrecision(3));
  return `${signed(String(percent), sign && percent > 0)} %`;
}

/** A difference with its sign always shown: +15 V, −220 Ω. */
export function formatDifference(value: number, unit: QuantityUnit): string {
  return signed(formatQuantity(value, unit), value > 0);
}

/** Seconds as whole minutes where they divide evenly (120 → "2 minutes"), else seconds. */
export function formatWait(seconds: number): string {
  if (seconds % 60 !== 0) return `${seconds} s`;
  const minutes = seconds / 60;
  return minutes === 1 ? '1 minute' : `${minutes} minutes`;
}

/** A plain number to `significant` figures, trailing zeros dropped: 11.30 → "11.3". */
export function formatNumber(value: number, significant = 3): string {
  return String(Number(value.toPrecision(significant))).replace('-', MINUS);
}
