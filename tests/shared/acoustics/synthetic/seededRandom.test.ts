import { describe, expect, it } from 'vitest'
import { createSeededRandom } from '../../../../shared/acoustics/synthetic/seededRandom'
import { expectWithin } from '../../../helpers/tolerance'

describe('createSeededRandom', () => {
  it('returns the same sequence for the same seed and another for another seed', () => {
    const draw = (seed: number) => {
      const random = createSeededRandom(seed)
      return Array.from({ length: 50 }, () => random.uniform())
    }
    expect(draw(42)).toEqual(draw(42))
    expect(draw(42)).not.toEqual(draw(43))
  })

  it('returns uniforms in [0, 1) with mean 1/2 and variance 1/12', () => {
    const random = createSeededRandom(1)
    const count = 200000
    let sum = 0
    let sumSquares = 0
    for (let i = 0; i < count; i++) {
      const value = random.uniform()
      expect(value >= 0 && value < 1).toBe(true)
      sum += value
      sumSquares += value * value
    }
    const mean = sum / count
    // Standard errors: 0.29/√n ≈ 6.5e-4 for the mean; tolerances are about 5 of them.
    expectWithin(mean, 0.5, 0.003)
    expectWithin(sumSquares / count - mean * mean, 1 / 12, 0.002)
  })

  it('returns Gaussians with mean 0, variance 1 and 4.55 % beyond ±2σ (normal distribution tables)', () => {
    const random = createSeededRandom(2)
    const count = 200000
    let sum = 0
    let sumSquares = 0
    let beyondTwo = 0
    for (let i = 0; i < count; i++) {
      const value = random.gaussian()
      sum += value
      sumSquares += value * value
      if (Math.abs(value) > 2) beyondTwo++
    }
    expectWithin(sum / count, 0, 0.012)
    expectWithin(sumSquares / count, 1, 0.02)
    expectWithin(beyondTwo / count, 0.0455, 0.003)
  })
})
