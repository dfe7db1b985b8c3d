import { describe, expect, it } from 'vitest'
import { pickEtcPeaks } from '../../../shared/room/etcPeakPicker'
import { expectWithin } from '../../helpers/tolerance'

/** A synthetic ETC: a −40 dB floor with triangular peaks (timeMs, levelDb, half-width 0.2 ms). */
function syntheticEtc(peaks: [number, number][]): { timeMs: number[]; levelDb: number[] } {
  const timeMs = Array.from({ length: 1201 }, (_, i) => i * 0.05)
  const levelDb = timeMs.map((t) => Math.max(-40, ...peaks.map(([at, level]) => level - 100 * Math.abs(t - at))))
  return { timeMs, levelDb }
}

describe('pickEtcPeaks', () => {
  it('returns peaks after the direct sound relative to it in time and level', () => {
    // constructed input (closed form): direct at 5 ms, 0 dB; reflections at +3.2 ms −9 dB and +7 ms −14 dB
    const { timeMs, levelDb } = syntheticEtc([[5, 0], [8.2, -9], [12, -14]])
    const result = pickEtcPeaks(timeMs, levelDb)
    expectWithin(result.directTimeMs, 5, 1e-9)
    expect(result.peaks).toHaveLength(2)
    expectWithin(result.peaks[0]!.timeMs, 3.2, 1e-9)
    expectWithin(result.peaks[0]!.levelDb, -9, 1e-9)
    expectWithin(result.peaks[1]!.timeMs, 7, 1e-9)
  })

  it('returns no peak below the threshold, before the direct sound or after maxDelayMs', () => {
    const { timeMs, levelDb } = syntheticEtc([[2, -12], [5, 0], [9, -30], [40, -10]])
    const result = pickEtcPeaks(timeMs, levelDb, { thresholdDb: 25, maxDelayMs: 30 })
    expect(result.peaks).toEqual([])
  })

  it('returns only the higher of two peaks closer than minSeparationMs', () => {
    const { timeMs, levelDb } = syntheticEtc([[5, 0], [10, -12], [10.4, -10]])
    const result = pickEtcPeaks(timeMs, levelDb, { minSeparationMs: 0.5 })
    expect(result.peaks).toHaveLength(1)
    expectWithin(result.peaks[0]!.levelDb, -10, 1e-9)
  })

  it('throws when the arrays differ in length', () => {
    expect(() => pickEtcPeaks([0, 1], [0])).toThrow(RangeError)
  })
})
