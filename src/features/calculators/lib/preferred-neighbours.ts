import { preferredValue, seriesValues } from '../../../../shared/bench';
import type { ESeries } from '../../../../shared/bench';

export const E_SERIES: readonly ESeries[] = ['E3', 'E6', 'E12', 'E24', 'E48', 'E96'];

/** The nearest preferred value to `value` (any unit) and the series values either side of it. */
export function preferredNeighbours(value: number, series: ESeries): { below: number; nearest: number; above: number } {
  const nearest = preferredValue(value, series);
  const decade = Math.floor(Math.log10(nearest));
  // Toleration of float drift: 4.7 × 10³ written through toPrecision stays 4700.
  const candidates = [decade - 1, decade, decade + 1].flatMap((exponent) =>
    seriesValues(series).map((mantissa) => Number((mantissa * 10 ** exponent).toPrecision(6))),
  );
  const same = (a: number) => Math.abs(a / nearest - 1) < 1e-9;
  const below = Math.max(...candidates.filter((c) => c < nearest && !same(c)));
  const above = Math.min(...candidates.filter((c) => c > nearest && !same(c)));
  return { below, nearest, above };
}
