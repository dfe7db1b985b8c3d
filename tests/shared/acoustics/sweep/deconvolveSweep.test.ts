import { describe, expect, it } from 'vitest'
import { fftConvolve } from '../../../../shared/acoustics/fft/fftConvolve'
import { computeFrequencyResponse } from '../../../../shared/acoustics/response/computeFrequencyResponse'
import { deconvolveSweep } from '../../../../shared/acoustics/sweep/deconvolveSweep'
import { generateSweep } from '../../../../shared/acoustics/sweep/generateSweep'
import { createSeededRandom } from '../../../../shared/acoustics/synthetic/seededRandom'
import { synthesizeRoomImpulse } from '../../../../shared/acoustics/synthetic/synthesizeRoomImpulse'
import { expectWithin } from '../../../helpers/tolerance'
import { bandLimit, normalisedCorrelation, peakIndex } from './bandLimit'

// Checks follow Farina (AES 108th Conv., 2000, preprint 5093) and ISO 18233:2006 Annex B: a
// recording made by convolving the sweep with a known response must give that response back.
const fs = 48000
const sweepOptions = { f1Hz: 20, f2Hz: 20000, durationS: 3, leadingSilenceS: 0.2, trailingSilenceS: 1 }
const { samples: sweep, parameters } = generateSweep({ ...sweepOptions, sampleRateHz: fs })
const directSamples = Math.round(0.004 * fs)
const room = synthesizeRoomImpulse({
  sampleRateHz: fs,
  durationS: 0.6,
  seed: 3,
  noiseFloorDb: -100,
  directDelayMs: 4,
  reflections: [{ delayMs: 6, gainDb: -6 }],
  bandDecays: [125, 250, 500, 1000, 2000, 4000].map((centreHz) => ({ centreHz, T60S: 0.3 })),
})
const band = { sampleRateHz: fs, lowHz: 2 * sweepOptions.f1Hz, highHz: sweepOptions.f2Hz / 2 }

function record(played: Float64Array, response: Float64Array, latencySamples = 0): Float64Array {
  const wet = fftConvolve(played, response)
  const recording = new Float64Array(played.length + latencySamples)
  recording.set(wet.subarray(0, played.length), latencySamples)
  return recording
}

/**
 * Compares the recovered response with the known one, both from the start of the recovered
 * pre-roll: the band-limited response rings a little before its peak, and that ringing belongs to
 * it (cutting it would bend the low end).
 */
function expectSameResponse(recovered: Float64Array, timeZeroSample: number, known: Float64Array, offsetSamples = 0): void {
  const aligned = recovered.slice(offsetSamples, timeZeroSample + offsetSamples + known.length)
  const expected = new Float64Array(aligned.length)
  expected.set(known, timeZeroSample)
  expect(normalisedCorrelation(bandLimit(aligned, band), bandLimit(expected, band))).toBeGreaterThan(0.99)
  const options = { sampleRateHz: fs, smoothingFraction: 6 as const, pointCount: 200 }
  const got = computeFrequencyResponse(aligned, options)
  const want = computeFrequencyResponse(expected, options)
  got.frequencyHz.forEach((f, i) => {
    if (f >= 40 && f <= 10000) expectWithin(got.magnitudeDb[i] as number, want.magnitudeDb[i] as number, 0.5)
  })
}

describe('deconvolveSweep', () => {
  const recording = record(sweep, room)
  const sweepParameters = { f1Hz: 20, f2Hz: 20000, durationS: 3, leadingSilenceS: 0.2 }

  it('returns the known response in time and frequency when given the sweep parameters', () => {
    const result = deconvolveSweep(recording, { sampleRateHz: fs, sweep: sweepParameters })
    expect(peakIndex(result.impulse) - result.timeZeroSample).toBe(directSamples)
    expectSameResponse(result.impulse, result.timeZeroSample, room)
    expect(result.sweepRateS).toBeCloseTo(parameters.sweepRateS, 12)
  })

  it('returns the known response when given the reference sweep instead', () => {
    const result = deconvolveSweep(recording, { sampleRateHz: fs, referenceSweep: sweep })
    expect(peakIndex(result.impulse) - result.timeZeroSample).toBe(directSamples)
    expectSameResponse(result.impulse, result.timeZeroSample, room)
    expectWithin(result.sweepRateS as number, parameters.sweepRateS, 0.005 * parameters.sweepRateS)
  })

  it('returns the direct sound later by the latency when the recording lags the playback', () => {
    const latencySamples = Math.round(0.03 * fs)
    const result = deconvolveSweep(record(sweep, room, latencySamples), { sampleRateHz: fs, sweep: sweepParameters })
    expect(peakIndex(result.impulse) - result.timeZeroSample).toBe(directSamples + latencySamples)
    expectSameResponse(result.impulse, result.timeZeroSample, room, latencySamples)
  })

  describe('with a second-order nonlinearity y = x + a·x²', () => {
    // x = A·sin φ → a·x² = a·A²/2·(1 − cos 2φ): the second harmonic is a·A/2 re the fundamental.
    const a = 0.1
    const expectedDb = 20 * Math.log10((a * parameters.amplitude) / 2)
    const delta = new Float64Array(Math.round(0.05 * fs))
    delta[directSamples] = 1
    const distorted = record(sweep.map((x) => x + a * x * x), delta)

    it.each([
      { name: 'sweep parameters', source: { sweep: sweepParameters } },
      { name: 'reference sweep', source: { referenceSweep: sweep } },
    ])('returns the injected 2nd harmonic level per octave band from the $name (Farina 2000)', ({ source }) => {
      const result = deconvolveSweep(distorted, { sampleRateHz: fs, ...source })
      expect(result.harmonicImpulses.map((h) => h.order)).toEqual([2, 3, 4, 5])
      const checked = result.distortion.filter((b) => b.centreHz >= 63 && b.centreHz <= 4000)
      expect(checked.length).toBe(7)
      for (const bandResult of checked) {
        expectWithin(bandResult.harmonicsDb[0]?.levelDb as number, expectedDb, 1)
        expect(bandResult.harmonicsDb[1]?.levelDb ?? -Infinity).toBeLessThan(expectedDb - 30)
        expectWithin(bandResult.thdPercent as number, 100 * Math.pow(10, expectedDb / 20), 0.3)
      }
      // 8 kHz: its 2nd harmonic (≤ 22.6 kHz) lies above the sweep, so it is not reported.
      expect(result.distortion.find((b) => b.centreHz === 8000)?.harmonicsDb[0]?.levelDb).toBeNull()
    })
  })

  it('returns the response without distortion, and says so, when the reference is not a sweep', () => {
    const random = createSeededRandom(21)
    const noise = Float64Array.from({ length: fs }, () => 0.1 * random.gaussian())
    const result = deconvolveSweep(record(noise, room), { sampleRateHz: fs, referenceSweep: noise })
    expect(result.distortion).toEqual([])
    expect(result.harmonicImpulses).toEqual([])
    expect(result.notes.join(' ')).toMatch(/not an exponential sweep/)
    expect(peakIndex(result.impulse) - result.timeZeroSample).toBe(directSamples)
  })

  it.each([
    { name: 'neither source', source: {}, message: /either the sweep parameters or the reference sweep/ },
    { name: 'both sources', source: { sweep: sweepParameters, referenceSweep: sweep }, message: /not both/ },
    { name: 'f2 above fs/2', source: { sweep: { ...sweepParameters, f2Hz: 30000 } }, message: /below half the sample rate/ },
    { name: 'a sweep longer than the recording', source: { sweep: { ...sweepParameters, durationS: 60 } }, message: /shorter than the sweep/ },
  ])('throws a DspInputError when given $name', ({ source, message }) => {
    expect(() => deconvolveSweep(recording, { sampleRateHz: fs, ...source })).toThrow(message)
  })

  it('throws a DspInputError when the recording is silent', () => {
    expect(() => deconvolveSweep(new Float64Array(fs * 4), { sampleRateHz: fs, sweep: sweepParameters })).toThrow(/silent/)
  })
})
