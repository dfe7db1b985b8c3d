import { describe, expect, it } from 'vitest'
import { averageDecayCurves } from '../../server/services/averageDecayCurves'
import type { AnalysisResult, DecayCurve } from '../../shared/types/analysis'

/** A straight Schroeder decay of reverberation time T: L(t) = −60·t/T dB (ISO 3382-1, closed form). */
function straightDecay(t60S: number, endMs: number): DecayCurve {
  const timeMs = Array.from({ length: 101 }, (_, i) => (endMs * i) / 100)
  return { centreHz: 1000, timeMs, levelDb: timeMs.map((t) => (-60 * t) / 1000 / t60S), fits: { EDT: null, T20: null, T30: null }, truncationMs: null }
}
const resultWith = (curve: DecayCurve) => ({ decays: [curve] }) as unknown as AnalysisResult

describe('averageDecayCurves', () => {
  it('returns the same straight decay when every position decays alike', () => {
    const [average] = averageDecayCurves([resultWith(straightDecay(0.5, 400)), resultWith(straightDecay(0.5, 400))])
    const at200 = average!.levelDb[average!.timeMs.findIndex((t) => t >= 200)]!
    expect(at200).toBeCloseTo(-24, 0) // −60·0.2/0.5
  })

  it('averages energy, not dB: the slower position dominates late in the decay', () => {
    const [average] = averageDecayCurves([resultWith(straightDecay(0.3, 300)), resultWith(straightDecay(0.6, 600))])
    expect(average!.timeMs.at(-1)).toBe(300) // the grid every position covers
    // At 300 ms: 10·lg((10^−6 + 10^−3)/2) = −33.0 dB, against a dB mean of −45 dB.
    expect(average!.levelDb.at(-1)!).toBeCloseTo(-33.0, 1)
  })
})
