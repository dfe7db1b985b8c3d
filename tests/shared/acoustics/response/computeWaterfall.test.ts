import { describe, expect, it } from 'vitest'
import { linearFit } from '../../../../shared/acoustics/linearFit'
import { computeWaterfall } from '../../../../shared/acoustics/response/computeWaterfall'
import { expectWithin, expectWithinPercent } from '../../../helpers/tolerance'

const fs = 48000

/** A mode ringing at 50 Hz with reverberation time T: amplitude e^(−3·ln10·t/T) (60 dB in T). */
function decayingSine(t60S: number, onsetSample: number): Float64Array {
  const signal = new Float64Array(2 * fs)
  for (let n = onsetSample; n < signal.length; n++) {
    const t = (n - onsetSample) / fs
    signal[n] = Math.exp((-3 * Math.LN10 * t) / t60S) * Math.sin(2 * Math.PI * 50 * t)
  }
  return signal
}

describe('computeWaterfall', () => {
  it.each([0.5, 1.0])('returns slices that fall by 60 dB per T60 at 50 Hz when T60 = %s s', (t60S) => {
    const waterfall = computeWaterfall(decayingSine(t60S, 480), { sampleRateHz: fs, onsetSample: 480 })
    const bin = waterfall.frequencyHz.reduce((best, f, i) => (Math.abs(f - 50) < Math.abs((waterfall.frequencyHz[best] as number) - 50) ? i : best), 0)
    const levels = waterfall.levelDb.map((slice) => slice[bin] as number)
    // Closed form: for an exponential decay every window sees the same shape scaled by e^(−kt).
    const fit = linearFit(waterfall.timeMs.slice(1), levels.slice(1))
    expectWithinPercent(-fit.slope * 1000, 60 / t60S, 3)
    expectWithin(levels[0] as number, 0, 0.5)
  })

  it('returns slices from 0 to 400 ms, ~160 log-spaced frequencies and levels within 0 … −60 dB', () => {
    const waterfall = computeWaterfall(decayingSine(0.3, 0), { sampleRateHz: fs, onsetSample: 0, minHz: 25, maxHz: 250 })
    expect(waterfall.timeMs[0]).toBe(0)
    expectWithin(waterfall.timeMs[waterfall.timeMs.length - 1] as number, 400, 1)
    expect(waterfall.frequencyHz.length).toBe(160)
    expectWithin(waterfall.frequencyHz[0] as number, 25, 1e-9)
    expectWithin(waterfall.frequencyHz[159] as number, 250, 1e-9)
    expect(waterfall.levelDb.length).toBe(waterfall.timeMs.length)
    const all = waterfall.levelDb.flat()
    expect(Math.max(...(waterfall.levelDb[0] as number[]))).toBe(0)
    expect(all.every((level) => level <= 1e-9 && level >= -60)).toBe(true)
  })

  it('throws a DspInputError when the range is not below 0.4·fs', () => {
    expect(() => computeWaterfall(decayingSine(0.3, 0), { sampleRateHz: 600, onsetSample: 0 })).toThrow(/0.4·fs/)
  })
})
