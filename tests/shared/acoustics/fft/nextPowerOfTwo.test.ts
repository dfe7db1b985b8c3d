import { describe, expect, it } from 'vitest'
import { isPowerOfTwo, nextPowerOfTwo } from '../../../../shared/acoustics/fft/nextPowerOfTwo'
import { getRealFftPlan } from '../../../../shared/acoustics/fft/realFftPlan'

describe('nextPowerOfTwo', () => {
  it('returns the smallest power of two not below the length', () => {
    expect([0, 1, 2, 3, 4, 5, 1000, 1024, 1025].map(nextPowerOfTwo)).toEqual([1, 1, 2, 4, 4, 8, 1024, 1024, 2048])
    expect([1, 2, 6, 64, 2.5].map(isPowerOfTwo)).toEqual([true, true, false, true, false])
  })
})

describe('getRealFftPlan', () => {
  it('returns the same cached plan for the same size', () => {
    expect(getRealFftPlan(512)).toBe(getRealFftPlan(512))
  })
})
