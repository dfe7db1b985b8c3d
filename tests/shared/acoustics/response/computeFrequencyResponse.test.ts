import { describe, expect, it } from 'vitest'
import { applySos } from '../../../../shared/acoustics/filters/applySos'
import type { SosCascade } from '../../../../shared/acoustics/filters/sosCascade'
import { computeFrequencyResponse } from '../../../../shared/acoustics/response/computeFrequencyResponse'
import { peakingEqBiquad } from '../../../../shared/acoustics/response/peakingEqBiquad'
import { expectWithin } from '../../../helpers/tolerance'

const fs = 48000

function unitImpulse(length: number, at = 0): Float64Array {
  const impulse = new Float64Array(length)
  impulse[at] = 1
  return impulse
}

/** |H(e^jω)|² of one biquad section from its coefficients, evaluated in closed form. */
function analyticPower(filter: SosCascade, frequencyHz: number): number {
  const [b0, b1, b2, a1, a2] = Array.from(filter.coefficients) as [number, number, number, number, number]
  const w = (2 * Math.PI * frequencyHz) / fs
  const power = (c0: number, c1: number, c2: number) =>
    (c0 + c1 * Math.cos(w) + c2 * Math.cos(2 * w)) ** 2 + (c1 * Math.sin(w) + c2 * Math.sin(2 * w)) ** 2
  return power(b0, b1, b2) / power(1, a1, a2)
}

describe('computeFrequencyResponse', () => {
  it('returns the analytic |H| of an Audio EQ Cookbook peaking biquad within 0.5 dB', () => {
    const filter = peakingEqBiquad({ sampleRateHz: fs, centreHz: 1000, gainDb: 9, q: 2 })
    const impulse = applySos(filter, unitImpulse(fs))
    const response = computeFrequencyResponse(impulse, { sampleRateHz: fs, smoothingFraction: 48 })
    response.frequencyHz.forEach((f, i) => expectWithin(response.magnitudeDb[i] as number, 10 * Math.log10(analyticPower(filter, f)), 0.5))
    const atCentre = response.magnitudeDb[response.frequencyHz.findIndex((f) => f >= 1000)] as number
    expectWithin(atCentre, 9, 0.5)
  })

  it('returns 0 dB and 0° everywhere for a unit impulse at the onset, at any smoothing', () => {
    for (const smoothingFraction of [1, 3, 48] as const) {
      const response = computeFrequencyResponse(unitImpulse(4800, 240), { sampleRateHz: fs, smoothingFraction, onsetSample: 240 })
      response.magnitudeDb.forEach((level) => expectWithin(level, 0, 1e-9))
      response.phaseDeg.forEach((phase) => expectWithin(phase, 0, 1e-6))
    }
  })

  it('returns a log-spaced grid of pointCount points from 20 Hz to min(20 kHz, fs/2)', () => {
    const wide = computeFrequencyResponse(unitImpulse(1000), { sampleRateHz: fs, smoothingFraction: 6 })
    expect(wide.frequencyHz.length).toBe(480)
    expectWithin(wide.frequencyHz[0] as number, 20, 1e-9)
    expectWithin(wide.frequencyHz[479] as number, 20000, 1e-6)
    const ratio = (wide.frequencyHz[1] as number) / (wide.frequencyHz[0] as number)
    expectWithin((wide.frequencyHz[300] as number) / (wide.frequencyHz[299] as number), ratio, 1e-9)
    const narrow = computeFrequencyResponse(unitImpulse(1000), { sampleRateHz: 22050, smoothingFraction: 6, pointCount: 100 })
    expect(narrow.frequencyHz.length).toBe(100)
    expectWithin(narrow.frequencyHz[99] as number, 11025, 1e-6)
  })

  it('returns the power average over the 1/3-octave window, filling in a single narrow notch (acoustics-facts §6)', () => {
    const notch = peakingEqBiquad({ sampleRateHz: fs, centreHz: 1000, gainDb: -30, q: 20 })
    const impulse = applySos(notch, unitImpulse(fs))
    const fine = computeFrequencyResponse(impulse, { sampleRateHz: fs, smoothingFraction: 48, pointCount: 2000 })
    const third = computeFrequencyResponse(impulse, { sampleRateHz: fs, smoothingFraction: 3, pointCount: 2000 })
    const index = fine.frequencyHz.findIndex((f) => f >= 1000)
    expect(fine.magnitudeDb[index] as number).toBeLessThan(-20)
    // The definition: mean of |H|² over [f·2^(−1/6), f·2^(1/6)], integrated from the closed form.
    const f = third.frequencyHz[index] as number
    const steps = 4000
    let powerSum = 0
    let decibelSum = 0
    for (let s = 0; s < steps; s++) {
      // Uniform in f, like the FFT bins the smoothing averages.
      const power = analyticPower(notch, f * Math.pow(2, -1 / 6) + ((s + 0.5) / steps) * f * (Math.pow(2, 1 / 6) - Math.pow(2, -1 / 6)))
      powerSum += power
      decibelSum += 10 * Math.log10(power)
    }
    expectWithin(third.magnitudeDb[index] as number, 10 * Math.log10(powerSum / steps), 0.1)
    // Averaging dB instead would over-weight the notch (acoustics-facts §6).
    expect(third.magnitudeDb[index] as number).toBeGreaterThan(decibelSum / steps + 2)
  })

  it('returns a flat response when the gate ends before a reflection, and ripple when it does not', () => {
    const impulse = unitImpulse(fs)
    impulse[Math.round(0.01 * fs)] = 0.5
    const gated = computeFrequencyResponse(impulse, { sampleRateHz: fs, smoothingFraction: 48, gateMs: 5 })
    gated.magnitudeDb.forEach((level) => expectWithin(level, 0, 1e-9))
    const ungated = computeFrequencyResponse(impulse, { sampleRateHz: fs, smoothingFraction: 48 })
    // |1 + 0.5·e^(−jωτ)| swings between 0.5 and 1.5: −6.0 to +3.5 dB where 1/48 octave < 100 Hz.
    const low = ungated.magnitudeDb.filter((_, i) => (ungated.frequencyHz[i] as number) < 300)
    expect(Math.max(...low) - Math.min(...low)).toBeGreaterThan(8)
  })

  it('returns the same magnitude with and without an onset delay, and a zero phase once the delay is removed', () => {
    const filter = peakingEqBiquad({ sampleRateHz: fs, centreHz: 200, gainDb: 6, q: 1 })
    const direct = applySos(filter, unitImpulse(fs))
    const delayed = applySos(filter, unitImpulse(fs + 480, 480))
    const a = computeFrequencyResponse(direct, { sampleRateHz: fs, smoothingFraction: 12 })
    const b = computeFrequencyResponse(delayed, { sampleRateHz: fs, smoothingFraction: 12, onsetSample: 480 })
    a.magnitudeDb.forEach((level, i) => expectWithin(b.magnitudeDb[i] as number, level, 1e-6))
    a.phaseDeg.forEach((phase, i) => expectWithin(b.phaseDeg[i] as number, phase, 1e-3))
  })

  it.each([
    { name: 'an unknown smoothing', options: { smoothingFraction: 5 }, message: /Smoothing/ },
    { name: 'a negative gate', options: { gateMs: -1 }, message: /time gate/ },
    { name: 'an onset past the end', options: { onsetSample: 5000 }, message: /onset/ },
    { name: 'one output point', options: { pointCount: 1 }, message: /pointCount/ },
  ])('throws a DspInputError when given $name', ({ options, message }) => {
    const call = () => computeFrequencyResponse(unitImpulse(100), { sampleRateHz: fs, smoothingFraction: 3, ...options } as never)
    expect(call).toThrow(message)
  })

  it('throws a DspInputError when the impulse is silent', () => {
    expect(() => computeFrequencyResponse(new Float64Array(100), { sampleRateHz: fs, smoothingFraction: 3 })).toThrow(/silent/)
  })
})
