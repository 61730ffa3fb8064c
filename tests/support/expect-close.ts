import { expect } from 'vitest'

/** Asserts |actual - expected| <= rel·max(|expected|, floor) (relative check with an absolute floor). */
export function expectClose(actual: number, expected: number, rel = 1e-9, floor = 1e-12): void {
  expect(Number.isFinite(actual), `expected a finite number, got ${actual}`).toBe(true)
  const tol = rel * Math.max(Math.abs(expected), floor)
  expect(Math.abs(actual - expected), `actual ${actual} vs expected ${expected} (tolerance ${tol})`).toBeLessThanOrEqual(tol)
}
