import { describe, expect, it } from 'vitest'
import { computeEnergyTimeCurve } from '../../../../shared/acoustics/response/computeEnergyTimeCurve'
import { expectWithin } from '../../../helpers/tolerance'

const fs = 48000

describe('computeEnergyTimeCurve', () => {
  it('returns its 0 dB peak at t = 0 for a single impulse at the onset', () => {
    const impulse = new Float64Array(4800)
    impulse[1000] = 0.3
    const curve = computeEnergyTimeCurve(impulse, { sampleRateHz: fs, onsetSample: 1000 })
    const peak = curve.levelDb.indexOf(Math.max(...curve.levelDb))
    expect(curve.levelDb[peak]).toBe(0)
    expect(curve.timeMs[peak]).toBe(0)
    expectWithin(curve.timeMs[0] as number, (-1000 * 1000) / fs, 1e-9)
    expect(curve.levelDb.every((level) => level <= 0)).toBe(true)
  })

  it('returns the burst amplitude as envelope: the Hilbert transform of a cosine is a sine (scipy.signal.hilbert documentation)', () => {
    // Two plateaus, amplitude 1 then 0.5, all edges slow raised cosines: ETC 0 dB, then −6.02 dB.
    const length = fs
    const burst = new Float64Array(length)
    const edge = 4800
    const smoothStep = (x: number) => (x <= 0 ? 0 : x >= 1 ? 1 : 0.5 * (1 - Math.cos(Math.PI * x)))
    for (let n = 0; n < length; n++) {
      const outline = smoothStep(n / edge) * smoothStep((length - n) / edge)
      const level = 1 - 0.5 * smoothStep((n - length / 2 + edge / 2) / edge)
      burst[n] = outline * level * Math.cos((2 * Math.PI * 1000 * n) / fs)
    }
    const curve = computeEnergyTimeCurve(burst, { sampleRateHz: fs, onsetSample: 0, maxPoints: length })
    for (const timeMs of [100, 200, 300]) expectWithin(curve.levelDb[Math.round((timeMs * fs) / 1000)] as number, 0, 0.05)
    for (const timeMs of [600, 700, 800]) expectWithin(curve.levelDb[Math.round((timeMs * fs) / 1000)] as number, 20 * Math.log10(0.5), 0.05)
  })

  it('returns a reflection at its level and time after decimating a long response to maxPoints', () => {
    const impulse = new Float64Array(10 * fs)
    impulse[0] = 1
    const reflectionSample = 123457
    impulse[reflectionSample] = 0.1
    const curve = computeEnergyTimeCurve(impulse, { sampleRateHz: fs, onsetSample: 0, maxPoints: 3000 })
    expect(curve.timeMs.length).toBe(3000)
    const index = curve.timeMs.findIndex((t) => Math.abs(t - (1000 * reflectionSample) / fs) < 1e-9)
    expect(index).toBeGreaterThan(0)
    expectWithin(curve.levelDb[index] as number, -20, 0.01)
    for (let i = 1; i < curve.timeMs.length; i++) expect(curve.timeMs[i] as number).toBeGreaterThan(curve.timeMs[i - 1] as number)
  })

  it('throws a DspInputError when the onset lies outside the response', () => {
    expect(() => computeEnergyTimeCurve(new Float64Array([1, 0, 0]), { sampleRateHz: fs, onsetSample: 3 })).toThrow(/onset/)
  })
})
