import { MINUS, signOf, withSign } from './sign';

/** A fraction as a per cent figure to `significant` figures, trailing zeros dropped: 0.0472 → "4.72", 0.1 → "10". */
export const percentFigure = (fraction: number, significant = 3): string =>
  String(Number((fraction * 100).toPrecision(significant)));

/** A fraction as per cent to three figures: 0.05 → "5 %"; with `sign`, 0.06 → "+6 %" and −0.1 → "−10 %". */
export function formatPercent(fraction: number, sign = false): string {
  const figure = percentFigure(fraction);
  return `${withSign(figure, sign && Number(figure) > 0)} %`;
}

/** A signed per cent to one decimal with a true minus: 0.128 → "+12.8 %", −0.2 → "−20.0 %", 0 → "0.0 %". */
export function signedPercent(fraction: number): string {
  return `${signOf(fraction)}${Math.abs(fraction * 100).toFixed(1)} %`;
}

/** Like signedPercent, with "—" for a missing or unreadable deviation. */
export const formatDeviation = (fraction: number | null): string =>
  fraction === null || !Number.isFinite(fraction) ? '—' : signedPercent(fraction);

/** A tolerance band: 0.1 → "±10 %", { minus: 0.2, plus: 0.5 } → "−20/+50 %" (figures to `significant`, default 3). */
export function formatTolerance(tolerance: number | { minus: number; plus: number }, significant = 3): string {
  const figure = (f: number) => percentFigure(f, significant);
  return typeof tolerance === 'number'
    ? `±${figure(tolerance)} %`
    : `${MINUS}${figure(tolerance.minus)}/+${figure(tolerance.plus)} %`;
}
