import { describe, expect, it } from 'vitest'
import { analyseCapture, DEFAULT_ANALYSIS_SETTINGS } from '../../../shared/acoustics/analyseCapture'
import { DspInputError } from '../../../shared/acoustics/errors'
import { fractionalOctaveBands } from '../../../shared/acoustics/bands/fractionalOctaveBands'
import { decodeWav } from '../../../shared/acoustics/wav/decodeWav'
import { encodeWav, type WavEncoding } from '../../../shared/acoustics/wav/encodeWav'
import type { AnalysisResult, BandResolution, BandResult } from '../../../shared/types/analysis'
import { expectWithin, expectWithinPercent } from '../../helpers/tolerance'
import { closedForm, exponentialEnvelope, noiseDecay, withNoiseFloor } from './signals'

/**
 * Clean band decays: tones at every other band centre, all under one exponential envelope, so each
 * analysed band holds a single decaying tone (neighbours two bands away are > 35 dB down).
 */
function toneDecays(options: { sampleRateHz: number; reverberationTimeS: number; bands: BandResolution; parity: 0 | 1 }): Float64Array {
  const { sampleRateHz, reverberationTimeS, bands, parity } = options
  const centres = fractionalOctaveBands({ bandsPerOctave: bands === 'octave' ? 1 : 3, sampleRateHz })
    .filter((_, index) => index % 2 === parity)
    .map((band) => band.exactCentreHz)
  const envelope = exponentialEnvelope(reverberationTimeS, sampleRateHz, 3 * reverberationTimeS + 0.8)
  const scale = 0.9 / Math.sqrt(centres.length)
  return envelope.map((value, n) => value * scale * centres.reduce((sum, f, i) => sum + Math.cos((2 * Math.PI * f * n) / sampleRateHz + i), 0))
}

function analyse(samples: Float64Array, sampleRateHz: number, bands: BandResolution): AnalysisResult {
  return analyseCapture(samples, { sampleRateHz, kind: 'impulse', settings: { ...DEFAULT_ANALYSIS_SETTINGS, bands } })
}

/** Issue #3 tolerances on clean synthetic decays (closed forms, acoustics-facts §11). */
function expectClosedForm(band: BandResult, reverberationTimeS: number): void {
  const expected = closedForm(reverberationTimeS)
  const timePercent = band.centreHz < 250 ? 10 : 5
  const timeTolerance = Math.max(0.02, (timePercent / 100) * reverberationTimeS)
  const label = `${band.centreHz} Hz, T = ${reverberationTimeS} s`
  expect(Math.abs((band.T20 as number) - reverberationTimeS), `T20 ${label}`).toBeLessThanOrEqual(timeTolerance)
  expect(Math.abs((band.T30 as number) - reverberationTimeS), `T30 ${label}`).toBeLessThanOrEqual(timeTolerance)
  expect(Math.abs((band.EDT as number) - reverberationTimeS), `EDT ${label}`).toBeLessThanOrEqual(0.1 * reverberationTimeS)
  expect(Math.abs((band.C50 as number) - expected.C50), `C50 ${label}`).toBeLessThanOrEqual(0.5)
  expect(Math.abs((band.C80 as number) - expected.C80), `C80 ${label}`).toBeLessThanOrEqual(0.5)
  expect(Math.abs((band.D50 as number) - expected.D50), `D50 ${label}`).toBeLessThanOrEqual(0.02)
  expect(Math.abs((band.Ts as number) - expected.Ts), `Ts ${label}`).toBeLessThanOrEqual(0.05 * expected.Ts)
}

const inCheckedRange = (band: BandResult) => band.centreHz >= 125 && band.centreHz <= 8000

describe('analyseCapture', () => {
  for (const sampleRateHz of [44100, 48000, 96000]) {
    for (const reverberationTimeS of [0.3, 0.5, 1, 2]) {
      const resolutions: BandResolution[] = sampleRateHz === 48000 ? ['octave', 'third'] : ['octave']
      for (const bands of resolutions) {
        it(`returns the closed-form T20, T30, EDT, C50, C80, D50, Ts per ${bands} band 125 Hz–8 kHz when T = ${reverberationTimeS} s at ${sampleRateHz} Hz`, () => {
          for (const parity of [0, 1] as const) {
            const result = analyse(toneDecays({ sampleRateHz, reverberationTimeS, bands, parity }), sampleRateHz, bands)
            const centres = fractionalOctaveBands({ bandsPerOctave: bands === 'octave' ? 1 : 3, sampleRateHz }).filter((_, i) => i % 2 === parity).map((b) => b.nominalHz)
            for (const band of result.bands.filter((b) => inCheckedRange(b) && centres.includes(b.centreHz))) expectClosedForm(band, reverberationTimeS)
          }
        })
      }
    }
  }

  it('keeps the closed forms within tolerance when a noise floor 60 dB below the start is added', () => {
    const reverberationTimeS = 0.5
    for (const parity of [0, 1] as const) {
      const clean = toneDecays({ sampleRateHz: 48000, reverberationTimeS, bands: 'octave', parity })
      const result = analyse(withNoiseFloor(clean, -60, 17 + parity), 48000, 'octave')
      const centres = fractionalOctaveBands({ bandsPerOctave: 1, sampleRateHz: 48000 }).filter((_, i) => i % 2 === parity).map((b) => b.nominalHz)
      for (const band of result.bands.filter((b) => inCheckedRange(b) && centres.includes(b.centreHz))) {
        expectClosedForm(band, reverberationTimeS)
        expect(band.decayRangeDb as number).toBeGreaterThan(40)
      }
    }
  })

  for (const encoding of ['pcm16', 'pcm24', 'float32'] as WavEncoding[]) {
    it(`returns the broadband closed forms after a ${encoding} WAV round trip, with and without a −70 dB noise floor`, () => {
      for (const floorDb of [null, -70]) {
        const envelope = exponentialEnvelope(1, 48000, 4).map((value) => 0.9 * value)
        const signal = floorDb === null ? envelope : withNoiseFloor(envelope, floorDb, 99)
        const decoded = decodeWav(encodeWav(signal, { sampleRateHz: 48000, encoding }))
        const { broadband } = analyse(decoded.samples, 48000, 'octave')
        const expected = closedForm(1)
        for (const name of ['EDT', 'T20', 'T30'] as const) expectWithinPercent(broadband[name] as number, 1, floorDb === null ? 0.5 : 2)
        expectWithin(broadband.C50 as number, expected.C50, floorDb === null ? 0.02 : 0.1)
        expectWithin(broadband.C80 as number, expected.C80, floorDb === null ? 0.02 : 0.1)
        expectWithin(broadband.D50 as number, expected.D50, 0.005)
        expectWithinPercent(broadband.Ts as number, expected.Ts, 1)
      }
    })
  }

  it('returns octave T30 within 5 % at 1–4 kHz when the decay is a seeded noise carrier (facts §11 spread)', () => {
    const result = analyse(noiseDecay({ reverberationTimeS: 1, sampleRateHz: 48000, durationS: 3.5, seed: 4 }), 48000, 'octave')
    for (const band of result.bands.filter((b) => b.centreHz >= 1000 && b.centreHz <= 4000)) expectWithinPercent(band.T30 as number, 1, 5)
  })

  it('returns a result whose curves are decimated, never raw sample arrays', () => {
    const result = analyse(toneDecays({ sampleRateHz: 48000, reverberationTimeS: 1, bands: 'third', parity: 0 }), 48000, 'third')
    expect(result.decays[0]?.centreHz).toBeNull()
    expect(result.decays.length).toBe(result.bands.length + 1)
    for (const curve of result.decays) expect(curve.timeMs.length).toBeLessThanOrEqual(4000)
    expect(result.energyTime.timeMs.length).toBeLessThanOrEqual(4000)
    expect(result.frequencyResponse.frequencyHz.length).toBeLessThanOrEqual(4000)
    expect(result.bands.at(-1)?.centreHz).toBe(16000)
    expect(JSON.parse(JSON.stringify(result)).schemaVersion).toBe(1)
  })

  it('throws DspInputError when the input is too short or a sweep has no parameters', () => {
    expect(() => analyse(exponentialEnvelope(0.1, 48000, 0.05), 48000, 'octave')).toThrow(DspInputError)
    expect(() =>
      analyseCapture(exponentialEnvelope(0.5, 48000, 1), { sampleRateHz: 48000, kind: 'sweep', settings: DEFAULT_ANALYSIS_SETTINGS }),
    ).toThrow(/sweep parameters/)
  })
})
