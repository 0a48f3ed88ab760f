/**
 * Assertion helpers for the acoustics tests.
 *
 * - `expectNear(actual, expected, tolerance)`: |actual − expected| ≤ tolerance.
 *   Used for [derived] reference values (default ±0.01 dB).
 * - `expectPrinted(actual, printed)`: the value agrees with a number printed
 *   in a source at the source's own precision, i.e. |actual − printed| ≤ half
 *   a unit in the last printed decimal place ("4.8" → ±0.05).
 */
import { expect } from "vitest";

export const DERIVED_DB_TOLERANCE = 0.01;

export function expectNear(actual: number, expected: number, tolerance: number = DERIVED_DB_TOLERANCE): void {
  expect(Number.isFinite(actual), `expected a finite number near ${expected}, got ${actual}`).toBe(true);
  expect(Math.abs(actual - expected), `|${actual} − ${expected}| should be ≤ ${tolerance}`).toBeLessThanOrEqual(tolerance);
}

export function expectPrinted(actual: number, printed: string): void {
  const expected = Number(printed);
  const decimals = printed.includes(".") ? printed.split(".")[1].length : 0;
  // Half a unit in the last place, plus a hair for binary rounding of the bound itself.
  const halfUnit = 0.5 * 10 ** -decimals + 1e-12;
  expect(Number.isFinite(actual), `expected a finite number near ${printed}, got ${actual}`).toBe(true);
  expect(Math.abs(actual - expected), `${actual} should print as ${printed}`).toBeLessThanOrEqual(halfUnit);
}
