import { describe, expect, it } from 'vitest'
import { expectWithin } from '../helpers/tolerance'
import { formatMeasure, fractionToPercent, NOT_COMPUTABLE, secondsToMilliseconds } from '@/utils/formatMeasure'

describe('formatMeasure', () => {
  it('returns fixed decimals with the unit when a value is given', () => {
    expect(formatMeasure(0.456, 2, 's')).toBe('0.46 s')
    expect(formatMeasure(3.549, 1, 'dB')).toBe('3.5 dB')
    expect(formatMeasure(2, 2)).toBe('2.00')
  })

  it('returns a true minus sign for negative values', () => {
    expect(formatMeasure(-0.447, 1, 'dB')).toBe('−0.4 dB')
  })

  it('returns 0 rather than −0 when a small negative value rounds to zero', () => {
    expect(formatMeasure(-0.004, 2)).toBe('0.00')
  })

  it('returns a dash when the value is null, undefined or not finite', () => {
    expect(formatMeasure(null, 2)).toBe(NOT_COMPUTABLE)
    expect(formatMeasure(undefined, 2)).toBe(NOT_COMPUTABLE)
    expect(formatMeasure(Number.POSITIVE_INFINITY, 2)).toBe(NOT_COMPUTABLE)
  })
})

describe('fractionToPercent', () => {
  it('returns percent when D50 is a fraction, null when it is null', () => {
    expectWithin(fractionToPercent(0.474) as number, 47.4, 1e-12)
    expect(fractionToPercent(null)).toBeNull()
  })
})

describe('secondsToMilliseconds', () => {
  it('returns milliseconds when Ts is in seconds', () => {
    expectWithin(secondsToMilliseconds(0.067) as number, 67, 1e-12)
  })
})
