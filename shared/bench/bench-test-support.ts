// Test-only helper: compare SI values by relative error, since absolute digits mean nothing for 3.3e-9 F.
import { expect } from 'vitest';

/** Asserts |actual − expected| ≤ fraction·|expected| (both in the same unit; fraction dimensionless). */
export function expectRelative(actual: number, expected: number, fraction = 1e-9): void {
  expect(Math.abs(actual - expected), `${actual} vs ${expected}`).toBeLessThanOrEqual(Math.abs(expected) * fraction);
}
