import { BenchInputError, requirePositive, scaleByPowerOfTen } from './bench-input-error';

export type ESeries = 'E3' | 'E6' | 'E12' | 'E24' | 'E48' | 'E96';

// Literal tables from IEC 60063, one decade. Never generate these by rounding 10^(k/n):
// E3–E24 keep historic values (E24 has 2.7 3.0 3.3 3.6 3.9 4.3 4.7 8.2, which rounding does not give).
const TABLES: Record<ESeries, readonly number[]> = {
  E3: [1.0, 2.2, 4.7],
  E6: [1.0, 1.5, 2.2, 3.3, 4.7, 6.8],
  E12: [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2],
  E24: [
    1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2,
    9.1,
  ],
  E48: [
    1.0, 1.05, 1.1, 1.15, 1.21, 1.27, 1.33, 1.4, 1.47, 1.54, 1.62, 1.69, 1.78, 1.87, 1.96, 2.05, 2.15, 2.26, 2.37, 2.49,
    2.61, 2.74, 2.87, 3.01, 3.16, 3.32, 3.48, 3.65, 3.83, 4.02, 4.22, 4.42, 4.64, 4.87, 5.11, 5.36, 5.62, 5.9, 6.19,
    6.49, 6.81, 7.15, 7.5, 7.87, 8.25, 8.66, 9.09, 9.53,
  ],
  E96: [
    1.0, 1.02, 1.05, 1.07, 1.1, 1.13, 1.15, 1.18, 1.21, 1.24, 1.27, 1.3, 1.33, 1.37, 1.4, 1.43, 1.47, 1.5, 1.54, 1.58,
    1.62, 1.65, 1.69, 1.74, 1.78, 1.82, 1.87, 1.91, 1.96, 2.0, 2.05, 2.1, 2.15, 2.21, 2.26, 2.32, 2.37, 2.43, 2.49,
    2.55, 2.61, 2.67, 2.74, 2.8, 2.87, 2.94, 3.01, 3.09, 3.16, 3.24, 3.32, 3.4, 3.48, 3.57, 3.65, 3.74, 3.83, 3.92,
    4.02, 4.12, 4.22, 4.32, 4.42, 4.53, 4.64, 4.75, 4.87, 4.99, 5.11, 5.23, 5.36, 5.49, 5.62, 5.76, 5.9, 6.04, 6.19,
    6.34, 6.49, 6.65, 6.81, 6.98, 7.15, 7.32, 7.5, 7.68, 7.87, 8.06, 8.25, 8.45, 8.66, 8.87, 9.09, 9.31, 9.53, 9.76,
  ],
};

function tableFor(series: ESeries): readonly number[] {
  const table = (TABLES as Partial<Record<string, readonly number[]>>)[series];
  if (table === undefined) {
    throw new BenchInputError(
      `'${String(series)}' is not a preferred-value series; use one of ${Object.keys(TABLES).join(', ')}.`,
    );
  }
  return table;
}

/** The preferred numbers of one decade (dimensionless, 1.0 up to below 10) of an IEC 60063 series, as a fresh array. */
export function seriesValues(series: ESeries): number[] {
  return [...tableFor(series)];
}

/**
 * The preferred value nearest to `value` (any unit, > 0; result in the same unit), measured by
 * ratio (|log(candidate / value)|), looking across decade edges (9.6 k → 10 k in E12).
 * Ratio distance matches how tolerances work; linear distance would favour the higher neighbour.
 */
export function preferredValue(value: number, series: ESeries): number {
  requirePositive(value, 'value to round to a preferred value');
  const table = tableFor(series);
  const decade = Math.floor(Math.log10(value));
  let best = value;
  let bestDistance = Infinity;
  for (const exponent of [decade - 1, decade, decade + 1]) {
    for (const mantissa of [...table, 10]) {
      const candidate = scaleByPowerOfTen(mantissa, exponent);
      const distance = Math.abs(Math.log(candidate / value));
      // On an exact tie the larger value wins; with ratio distance ties need a value at a geometric mean.
      if (distance < bestDistance || (distance === bestDistance && candidate > best)) {
        best = candidate;
        bestDistance = distance;
      }
    }
  }
  return best;
}
