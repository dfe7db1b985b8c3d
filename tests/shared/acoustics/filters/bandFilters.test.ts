import { describe, expect, it } from 'vitest'
import { fractionalOctaveBands, OCTAVE_RATIO as G, type BandsPerOctave } from '../../../../shared/acoustics/bands/fractionalOctaveBands'
import { applySos } from '../../../../shared/acoustics/filters/applySos'
import { decimateByTwo } from '../../../../shared/acoustics/filters/decimateByTwo'
import { designBandFilterBank, bandMagnitudeAt } from '../../../../shared/acoustics/filters/designBandFilterBank'
import { designButterworthBandPass } from '../../../../shared/acoustics/filters/designButterworthBandPass'
import { sosMagnitudeDbAt } from '../../../../shared/acoustics/filters/sosFrequencyResponse'
import { expectWithin } from '../../../helpers/tolerance'

// IEC 61260-1:2014 Table 1, class 1 (acoustics-facts §3), written out here independently of the
// shared limits function: [Ω_oct, min ΔA, max ΔA] on the high side, mirrored to 1/Ω.
const CLASS_1: [number, number, number][] = [
  [1, -0.4, 0.4], [G ** (1 / 8), -0.4, 0.5], [G ** (1 / 4), -0.4, 0.7], [G ** (3 / 8), -0.4, 1.4], [G ** 0.5 * (1 - 1e-9), -0.4, 5.3],
  [G ** 0.5 * (1 + 1e-9), 1.2, Infinity], [G, 16.6, Infinity], [G ** 2, 40.5, Infinity], [G ** 3, 60, Infinity], [G ** 4, 70, Infinity],
]
/** IEC 61260-1 Formula (9): octave breakpoint → 1/b-octave breakpoint. */
const toFractional = (omega: number, b: number) => 1 + ((G ** (1 / (2 * b)) - 1) / (G ** 0.5 - 1)) * (omega - 1)

describe('band filter bank', () => {
  for (const sampleRateHz of [22050, 44100, 48000, 96000, 192000]) {
    for (const bandsPerOctave of [1, 3] as BandsPerOctave[]) {
      it(`meets IEC 61260-1 class 1 at every Table 1 breakpoint for every ${bandsPerOctave === 1 ? 'octave' : 'third-octave'} band at ${sampleRateHz} Hz`, () => {
        const bands = fractionalOctaveBands({ bandsPerOctave, sampleRateHz, minNominalHz: 25 })
        const bank = designBandFilterBank(bands, bandsPerOctave, sampleRateHz)
        for (const entry of bank.bands) {
          const reference = 20 * Math.log10(bandMagnitudeAt(bank, entry, entry.band.exactCentreHz))
          for (const [omegaOctave, minDb, maxDb] of CLASS_1) {
            const omega = toFractional(omegaOctave, bandsPerOctave)
            for (const relative of [omega, 1 / omega]) {
              const frequencyHz = entry.band.exactCentreHz * relative
              if (frequencyHz >= sampleRateHz / 2) continue
              const attenuationDb = reference - 20 * Math.log10(bandMagnitudeAt(bank, entry, frequencyHz))
              const where = `${entry.band.nominalHz} Hz at Ω = ${relative.toFixed(4)}: ΔA = ${attenuationDb.toFixed(2)} dB`
              expect(attenuationDb, where).toBeGreaterThanOrEqual(minDb)
              expect(attenuationDb, where).toBeLessThanOrEqual(maxDb)
            }
          }
        }
      })
    }
  }

  it('puts the −3.01 dB points on the band edges (pre-warped bilinear design)', () => {
    const band = fractionalOctaveBands({ bandsPerOctave: 1, minNominalHz: 4000, maxNominalHz: 4000 })[0]!
    const filter = designButterworthBandPass({ lowerEdgeHz: band.lowerEdgeHz, upperEdgeHz: band.upperEdgeHz, sampleRateHz: 48000 })
    expectWithin(sosMagnitudeDbAt(filter, band.lowerEdgeHz, 48000), -3.0103, 0.001)
    expectWithin(sosMagnitudeDbAt(filter, band.upperEdgeHz, 48000), -3.0103, 0.001)
    expectWithin(sosMagnitudeDbAt(filter, Math.sqrt(band.lowerEdgeHz * band.upperEdgeHz * 1.0), 48000), 0, 0.05)
  })

  it('filters a 50 Hz tone at 192 kHz with the gain its magnitude response predicts (numerical precision)', () => {
    const sampleRateHz = 192000
    const bank = designBandFilterBank(fractionalOctaveBands({ bandsPerOctave: 3, sampleRateHz, minNominalHz: 50, maxNominalHz: 50 }), 3, sampleRateHz)
    const entry = bank.bands[0]!
    const frequencyHz = 55
    const tone = new Float64Array(4 * sampleRateHz).map((_, n) => Math.sin((2 * Math.PI * frequencyHz * n) / sampleRateHz))
    let input: Float64Array = tone
    for (let factor = 1; factor < entry.decimationFactor; factor *= 2) input = decimateByTwo(input, bank.halfBandTaps)
    const output = applySos(entry.filter, input)
    let power = 0
    const start = Math.floor(output.length / 2)
    for (let n = start; n < output.length; n++) power += (output[n] as number) ** 2
    const measuredDb = 10 * Math.log10(power / (output.length - start) / 0.5)
    expectWithin(measuredDb, 20 * Math.log10(bandMagnitudeAt(bank, entry, frequencyHz)), 0.02)
  })

  it('keeps |H| when filtering time-reversed (ISO 3382-2 7.3 NOTE) and leaves the input untouched', () => {
    const band = fractionalOctaveBands({ bandsPerOctave: 1, minNominalHz: 1000, maxNominalHz: 1000 })[0]!
    const filter = designButterworthBandPass({ lowerEdgeHz: band.lowerEdgeHz, upperEdgeHz: band.upperEdgeHz, sampleRateHz: 48000 })
    const impulse = new Float64Array(4800)
    impulse[2400] = 1
    const forward = applySos(filter, impulse)
    const reversed = applySos(filter, impulse, { timeReversed: true })
    // The reversed response is the forward one mirrored about the impulse.
    for (let k = 0; k < 2400; k++) expectWithin(reversed[2400 - k] as number, forward[2400 + k] as number, 1e-12)
    expect(impulse[2400]).toBe(1)
  })

  it('returns the Audio EQ Cookbook peaking-EQ gain at its centre and far away (sosMagnitudeAt vs analytic)', () => {
    // R. Bristow-Johnson, "Cookbook formulae for audio EQ biquad filter coefficients": peaking EQ,
    // f0 = 1 kHz, Q = 2, +6 dB at fs = 48 kHz → |H(f0)| = A² = 10^(6/20), |H(0)| = 1.
    const fs = 48000
    const A = 10 ** (6 / 40)
    const w0 = (2 * Math.PI * 1000) / fs
    const alpha = Math.sin(w0) / (2 * 2)
    const a0 = 1 + alpha / A
    const row = [(1 + alpha * A) / a0, (-2 * Math.cos(w0)) / a0, (1 - alpha * A) / a0, (-2 * Math.cos(w0)) / a0, (1 - alpha / A) / a0] as const
    const filter = { sectionCount: 1, coefficients: new Float64Array(row) }
    expectWithin(sosMagnitudeDbAt(filter, 1000, fs), 6, 1e-9)
    expectWithin(sosMagnitudeDbAt(filter, 1e-6, fs), 0, 1e-6)
  })
})
