import { describe, expect, it } from 'vitest'
import { interpolateInLogFrequency, isBandWithin } from '../../../../shared/room/targets/targetMask'
import { expectWithin } from '../../../helpers/tolerance'

describe('interpolateInLogFrequency', () => {
  const points: [number, number][] = [[125, 1.45], [250, 1.2]]

  it('returns the mean at the geometric-mean frequency', () => {
    // linear in lg f (closed form): halfway in lg f between 125 and 250 Hz is sqrt(125·250) = 176.8 Hz
    expectWithin(interpolateInLogFrequency(points, Math.sqrt(125 * 250)), 1.325, 1e-12)
  })

  it('returns the end values outside the points and the points themselves', () => {
    expect([interpolateInLogFrequency(points, 50), interpolateInLogFrequency(points, 125), interpolateInLogFrequency(points, 250), interpolateInLogFrequency(points, 9000)]).toEqual([1.45, 1.45, 1.2, 1.2])
  })

  it('throws with no points', () => {
    expect(() => interpolateInLogFrequency([], 100)).toThrow(RangeError)
  })
})

describe('isBandWithin', () => {
  it('returns true for nominal centres at the edges of a range', () => {
    expect([isBandWithin(200, 200, 4000), isBandWithin(4000, 200, 4000), isBandWithin(160, 200, 4000), isBandWithin(5000, 200, 4000)]).toEqual([true, true, false, false])
  })
})
