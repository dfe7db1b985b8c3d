import { describe, it } from 'vitest'
import { harmonicDelayS, sweepInstantaneousFrequencyHz, sweepRateS } from '../../../../shared/acoustics/sweep/sweepRate'
import { expectWithin } from '../../../helpers/tolerance'

describe('sweepRate', () => {
  it('returns L = 1.44765 s for 20 Hz–20 kHz in 10 s (Farina 2000; acoustics-facts check values)', () => {
    expectWithin(sweepRateS(20, 20000, 10), 1.44765, 1e-5)
  })

  it('returns harmonic delays 1.0034 s (k = 2) and 1.5904 s (k = 3) for that sweep (Δt_k = L·ln k)', () => {
    const rate = sweepRateS(20, 20000, 10)
    expectWithin(harmonicDelayS(rate, 2), 1.0034, 1e-4)
    expectWithin(harmonicDelayS(rate, 3), 1.5904, 1e-4)
  })

  it('returns f1 at the start and f2 at the end of the sweep (f(t) = f1·e^(t/L))', () => {
    const rate = sweepRateS(20, 20000, 10)
    expectWithin(sweepInstantaneousFrequencyHz(20, rate, 0), 20, 1e-12)
    expectWithin(sweepInstantaneousFrequencyHz(20, rate, 10), 20000, 1e-9)
  })
})
