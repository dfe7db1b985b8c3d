import { expect } from 'vitest'

/** Asserts |actual − expected| ≤ absolute tolerance, with a message that shows all three. */
export function expectWithin(actual: number, expected: number, tolerance: number): void {
  expect(Number.isFinite(actual), `expected a finite number, got ${actual}`).toBe(true)
  expect(Math.abs(actual - expected), `${actual} vs ${expected} ± ${tolerance}`).toBeLessThanOrEqual(tolerance)
}

/** Asserts |actual − expected| ≤ percent·|expected|/100. */
export function expectWithinPercent(actual: number, expected: number, percent: number): void {
  expectWithin(actual, expected, (Math.abs(expected) * percent) / 100)
}
