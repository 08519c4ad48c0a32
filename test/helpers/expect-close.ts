/**
 * One comparison helper for every numeric check: passes when |actual − expected| ≤ abs or
 * ≤ rel·|expected|, and fails showing both numbers and the deviation.
 */
import { expect } from "vitest";

/** Tolerances: either or both. */
export interface Tolerance {
  readonly rel?: number;
  readonly abs?: number;
}

export function expectClose(actual: number, expected: number, tolerance: Tolerance): void {
  const deviation = Math.abs(actual - expected);
  const allowed = Math.max(tolerance.abs ?? 0, (tolerance.rel ?? 0) * Math.abs(expected));
  const ok = Number.isFinite(actual) && deviation <= allowed;
  expect(
    ok,
    `expected ${expected}, got ${actual} (deviation ${deviation.toExponential(3)}, ` +
      `relative ${(deviation / Math.abs(expected)).toExponential(3)}, allowed ${allowed.toExponential(3)})`,
  ).toBe(true);
}
