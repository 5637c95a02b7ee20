import { expect } from "vitest";

/** Asserts |actual - expected| <= relTol |expected| (expected must be non-zero). */
export function expectRelative(actual: number, expected: number, relTol: number): void {
  expect(Number.isFinite(actual)).toBe(true);
  const rel = Math.abs(actual - expected) / Math.abs(expected);
  expect(rel, `actual ${actual}, expected ${expected}, relative error ${rel} > ${relTol}`).toBeLessThanOrEqual(relTol);
}

/** Asserts |actual - expected| <= absTol. */
export function expectAbsolute(actual: number, expected: number, absTol: number): void {
  expect(Number.isFinite(actual)).toBe(true);
  const err = Math.abs(actual - expected);
  expect(err, `actual ${actual}, expected ${expected}, error ${err} > ${absTol}`).toBeLessThanOrEqual(absTol);
}
