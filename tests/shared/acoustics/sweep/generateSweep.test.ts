import { describe, expect, it } from 'vitest'
import { generateSweep } from '../../../../shared/acoustics/sweep/generateSweep'
import { expectWithin, expectWithinPercent } from '../../../helpers/tolerance'

const fs = 48000
const options = { f1Hz: 20, f2Hz: 20000, durationS: 2, sampleRateHz: fs }

/** Times of the upward and downward zero crossings, by linear interpolation, s. */
function zeroCrossingTimes(samples: Float64Array, from: number, to: number): number[] {
  const times: number[] = []
  for (let n = from; n < to - 1; n++) {
    const a = samples[n] as number
    const b = samples[n + 1] as number
    if ((a <= 0 && b > 0) || (a >= 0 && b < 0)) times.push((n + a / (a - b)) / fs)
  }
  return times
}

describe('generateSweep', () => {
  it('returns a sweep whose instantaneous frequency is f1·e^(t/L) (Farina 2000; ISO 18233 B.3.2)', () => {
    const { samples, parameters } = generateSweep({ ...options, fadeInS: 0, fadeOutS: 0 })
    const rate = parameters.sweepRateS
    // Local frequency from the spacing of successive zero crossings, 1/(2·Δt), at several times.
    for (const timeS of [0.25, 0.7, 1.0, 1.4]) {
      const centre = Math.round(timeS * fs)
      const halfSpan = Math.ceil((2 * fs) / (20 * Math.exp(timeS / rate)))
      const crossings = zeroCrossingTimes(samples, centre - halfSpan, centre + halfSpan)
      const mid = Math.floor(crossings.length / 2)
      const spacingS = (crossings[mid + 1] as number) - (crossings[mid] as number)
      const atS = 0.5 * ((crossings[mid + 1] as number) + (crossings[mid] as number))
      expectWithinPercent(1 / (2 * spacingS), 20 * Math.exp(atS / rate), 1.5)
    }
  })

  it('returns as many zero crossings as the phase 2π·f1·L·(e^(t/L) − 1) has half cycles', () => {
    const { samples, parameters } = generateSweep({ ...options, fadeInS: 0, fadeOutS: 0 })
    const crossings = zeroCrossingTimes(samples, 1, Math.round(0.5 * fs))
    const halfCycles = 2 * 20 * parameters.sweepRateS * (Math.exp(0.5 / parameters.sweepRateS) - 1)
    expectWithin(crossings.length, halfCycles, 2)
  })

  it('returns a −6 dBFS peak by default and the requested level otherwise', () => {
    const loud = generateSweep(options)
    const quiet = generateSweep({ ...options, levelDb: -20 })
    const peakOf = (x: Float64Array) => x.reduce((m, v) => Math.max(m, Math.abs(v)), 0)
    expectWithin(20 * Math.log10(peakOf(loud.samples)), -6, 0.01)
    expectWithin(20 * Math.log10(peakOf(quiet.samples)), -20, 0.01)
    expectWithin(loud.parameters.amplitude, Math.pow(10, -6 / 20), 1e-12)
  })

  it('returns silence before and after the sweep and fades that start and end at zero', () => {
    const { samples, parameters } = generateSweep({ ...options, leadingSilenceS: 0.25, trailingSilenceS: 0.5, fadeInS: 0.1, fadeOutS: 0.01 })
    expect(parameters.sweepStartSample).toBe(12000)
    expect(parameters.sweepSampleCount).toBe(96000)
    expect(samples.length).toBe(12000 + 96000 + 24000)
    expect(samples.subarray(0, 12000).every((v) => v === 0)).toBe(true)
    expect(samples.subarray(12000 + 96000).every((v) => v === 0)).toBe(true)
    expectWithin(samples[12000] as number, 0, 1e-12)
    expectWithin(samples[12000 + 95999] as number, 0, 1e-12)
  })

  it.each([
    [{ f2Hz: 24000 }, /below half the sample rate/],
    [{ f1Hz: 30000, f2Hz: 20000 }, /above the start frequency/],
    [{ f1Hz: 0 }, /above 0 Hz/],
    [{ durationS: 0 }, /positive number of seconds/],
    [{ durationS: -1 }, /positive number of seconds/],
    [{ levelDb: 3 }, /at most 0 dBFS/],
    [{ fadeInS: 1.5, fadeOutS: 1 }, /longer than the sweep/],
    [{ leadingSilenceS: -1 }, /leading silence/],
    [{ sampleRateHz: Number.NaN }, /sample rate/],
  ])('throws a DspInputError with a clear message when given %o', (change, message) => {
    expect(() => generateSweep({ ...options, ...change })).toThrow(message)
  })
})
