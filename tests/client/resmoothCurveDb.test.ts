import { describe, expect, it } from 'vitest'
import { resmoothCurveDb } from '@/utils/resmoothCurveDb'
import { expectWithin } from '../helpers/tolerance'

/** n points spaced 1/24 octave from 100 Hz. */
function logGrid(pointCount: number): number[] {
  return Array.from({ length: pointCount }, (_, i) => 100 * 2 ** (i / 24))
}

describe('resmoothCurveDb', () => {
  it('returns a flat curve unchanged when every level is the same', () => {
    const grid = logGrid(100)

    const smoothed = resmoothCurveDb(grid, grid.map(() => -6), 3)

    for (const levelDb of smoothed) expectWithin(levelDb, -6, 1e-9)
  })

  it('returns the power average of the points in the window (closed form)', () => {
    // Grid 1/24 octave, 1/1-octave window: ±1/2 octave = ±12 points around the middle point.
    const grid = logGrid(49)
    const levels = grid.map((_, i) => (i % 2 === 0 ? 0 : -10))

    const smoothed = resmoothCurveDb(grid, levels, 1)

    // 25 points around index 24: 13 at 0 dB (power 1) and 12 at −10 dB (power 0.1).
    const expectedDb = 10 * Math.log10((13 * 1 + 12 * 0.1) / 25)
    expectWithin(smoothed[24] as number, expectedDb, 1e-6)
  })

  it('leaves non-finite levels out of the average', () => {
    const grid = logGrid(5)

    const smoothed = resmoothCurveDb(grid, [0, Number.NaN, 0, Number.NEGATIVE_INFINITY, 0], 1)

    for (const levelDb of smoothed) expectWithin(levelDb, 0, 1e-9)
  })

  it('returns the input levels when the window holds one point only', () => {
    const grid = [100, 200, 400, 800]

    expect(resmoothCurveDb(grid, [1, 2, 3, 4], 6).map((v) => Number(v.toFixed(9)))).toEqual([1, 2, 3, 4])
  })
})
