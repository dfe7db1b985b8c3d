import { describe, expect, it } from 'vitest'
import { linearFit, linearFitUniform } from '../../../shared/acoustics/linearFit'
import { expectWithin } from '../../helpers/tolerance'

describe('linearFit', () => {
  it('returns slope, intercept and r² = 1 when the points lie on a line', () => {
    const fit = linearFit([0, 1, 2, 3], [1, 3, 5, 7])
    expectWithin(fit.slope, 2, 1e-12)
    expectWithin(fit.intercept, 1, 1e-12)
    expectWithin(fit.r2, 1, 1e-12)
  })

  it('returns the textbook least-squares values for scattered points', () => {
    // x = 1..5, y = 2, 4, 5, 4, 5: slope 0.6, intercept 2.2, r² = 0.6 (hand-computed OLS)
    const fit = linearFit([1, 2, 3, 4, 5], [2, 4, 5, 4, 5])
    expectWithin(fit.slope, 0.6, 1e-12)
    expectWithin(fit.intercept, 2.2, 1e-12)
    expectWithin(fit.r2, 0.6, 1e-12)
  })

  it('agrees with linearFitUniform when x is index × step', () => {
    const y = [5, 3.9, 3.1, 2.2, 0.8, 0.1]
    const a = linearFit(y.map((_, i) => (i + 2) * 0.5).slice(0, 4), y.slice(2, 6))
    const b = linearFitUniform(y, 2, 6, 0.5)
    expect(b.count).toBe(4)
    expectWithin(b.slope, a.slope, 1e-12)
    expectWithin(b.intercept, a.intercept, 1e-12)
    expectWithin(b.r2, a.r2, 1e-12)
  })
})
