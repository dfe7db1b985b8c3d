// Measured impulse responses, read in place (never copied into the project):
// - BRAS – Benchmark for Room Acoustical Simulation, L. Aspöck, M. Vorländer, F. Brinkmann,
//   D. Ackermann, S. Weinzierl, TU Berlin / RWTH Aachen, DOI 10.14279/depositonce-6726.3, CC BY-SA 4.0.
// - OpenAIR, www.openairlib.net, Audiolab, University of York (Sports Centre, University of York),
//   CC BY-SA 3.0.
import { existsSync, readFileSync } from 'node:fs'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { analyseCapture, DEFAULT_ANALYSIS_SETTINGS } from '../../../../shared/acoustics/analyseCapture'
import { analyseBandDecays } from '../../../../shared/acoustics/analyseBandDecays'
import { fitDecayRange } from '../../../../shared/acoustics/decay/fitDecayRange'
import { suffixEnergySums } from '../../../../shared/acoustics/decay/schroederIntegral'
import { toEnergy } from '../../../../shared/acoustics/decay/toEnergy'
import { fractionalOctaveBands } from '../../../../shared/acoustics/bands/fractionalOctaveBands'
import { designBandFilterBank } from '../../../../shared/acoustics/filters/designBandFilterBank'
import { applySos } from '../../../../shared/acoustics/filters/applySos'
import { decimateByTwo } from '../../../../shared/acoustics/filters/decimateByTwo'
import { findImpulseOnset } from '../../../../shared/acoustics/onset'
import { decodeWav } from '../../../../shared/acoustics/wav/decodeWav'

const root = process.env.RINGDOWN_DATASETS ?? '/work/shared/datasets'
const brasFile = join(root, 'bras-cr2', 'scene9_RIR_LS1_MP1_Dodecahedron.wav')
const openAirFile = join(root, 'openair-york-sports-centre', 'ir_sportscentre_omni.wav')
const hasBras = existsSync(brasFile)
const hasOpenAir = existsSync(openAirFile)
if (!hasBras) console.log(`BRAS CR2 dataset not found at ${brasFile}: skipping (set RINGDOWN_DATASETS)`)
if (!hasOpenAir) console.log(`OpenAIR sports centre dataset not found at ${openAirFile}: skipping (set RINGDOWN_DATASETS)`)

describe.skipIf(!hasBras)('BRAS CR2 seminar room (room-average values, plausibility)', () => {
  const reference = hasBras
    ? (JSON.parse(readFileSync(join(root, 'bras-cr2', 'reference.json'), 'utf8')) as { bands: Record<string, { T20: number; EDT: number; C80: number; D50: number }> })
    : null
  const decoded = hasBras ? decodeWav(new Uint8Array(readFileSync(brasFile))) : null
  const analyse = (timeReversedFiltering: boolean) =>
    analyseCapture(decoded?.samples as Float64Array, { sampleRateHz: 44100, kind: 'impulse', settings: { ...DEFAULT_ANALYSIS_SETTINGS, bands: 'third', timeReversedFiltering } })

  function compare(result: ReturnType<typeof analyse>, parameters: ('T20' | 'EDT' | 'C80' | 'D50')[]): number {
    const limits = { T20: 0.1, EDT: 0.25, C80: 2, D50: 0.12 } // dataset README's plausibility test
    let checked = 0
    for (const band of result.bands.filter((b) => b.centreHz >= 250 && b.centreHz <= 16000)) {
      const published = reference?.bands[String(band.centreHz)]
      if (!published) throw new Error(`no published value for ${band.centreHz} Hz`)
      for (const name of parameters) {
        const value = band[name] as number
        const deviation = name === 'T20' || name === 'EDT' ? Math.abs(value / published[name] - 1) : Math.abs(value - published[name])
        expect(deviation, `${name} ${band.centreHz} Hz: ${value} vs ${published[name]}`).toBeLessThanOrEqual(limits[name])
      }
      checked++
    }
    return checked
  }

  it('decodes the 44.1 kHz float file and finds the README onset', () => {
    expect([decoded?.sampleRateHz, decoded?.format, decoded?.bitDepth, decoded?.samples.length]).toEqual([44100, 'float', 32, 154350])
    expect(analyse(true).onsetSample).toBe(576) // README: first sample within 20 dB of the peak
  })

  it('returns third-octave T20 ±10 %, EDT ±25 %, C80 ±2 dB, D50 ±0.12 of the published room means 250 Hz–16 kHz with forward filtering (dataset README)', () => {
    expect(compare(analyse(false), ['T20', 'EDT', 'C80', 'D50'])).toBe(19)
  })

  it('returns T20, EDT and D50 within the same bounds with time-reversed filtering (C80 at 800 Hz is 2.5 dB above the room mean then)', () => {
    expect(compare(analyse(true), ['T20', 'EDT', 'D50'])).toBe(19)
  })
})

describe.skipIf(!hasOpenAir)('OpenAIR sports centre (no reference values, plausibility)', () => {
  const decoded = hasOpenAir ? decodeWav(new Uint8Array(readFileSync(openAirFile))) : null

  it('decodes the 96 kHz 16-bit file with the README facts', () => {
    expect([decoded?.sampleRateHz, decoded?.format, decoded?.bitDepth, decoded?.samples.length]).toEqual([96000, 'pcm', 16, 940800])
    expect(findImpulseOnset(decoded?.samples as Float64Array).peakSample).toBe(2619)
  })

  it('returns octave T30 in 3.5–7.5 s from 500 Hz to 4 kHz (dataset README plausibility bounds)', () => {
    const samples = decoded?.samples as Float64Array
    const { onsetSample } = findImpulseOnset(samples)
    const { bands } = analyseBandDecays(samples, { sampleRateHz: 96000, onsetSample, bands: 'octave', isTimeReversed: true })
    for (const band of bands.filter((b) => b.centreHz >= 500 && b.centreHz <= 4000)) {
      expect(band.T30 as number, `${band.centreHz} Hz`).toBeGreaterThanOrEqual(3.5)
      expect(band.T30 as number, `${band.centreHz} Hz`).toBeLessThanOrEqual(7.5)
    }
  })

  it('lowers T30 at 125 and 250 Hz compared with the plain whole-file Schroeder integral (noise handling)', () => {
    const samples = decoded?.samples as Float64Array
    const { onsetSample } = findImpulseOnset(samples)
    const { bands } = analyseBandDecays(samples, { sampleRateHz: 96000, onsetSample, bands: 'octave', isTimeReversed: true })
    const bank = designBandFilterBank(fractionalOctaveBands({ bandsPerOctave: 1, minNominalHz: 125, maxNominalHz: 250 }), 1, 96000)
    for (const entry of bank.bands) {
      let input = samples.subarray(onsetSample)
      for (let factor = 1; factor < entry.decimationFactor; factor *= 2) input = decimateByTwo(input, bank.halfBandTaps)
      const energy = toEnergy(applySos(entry.filter, input, { timeReversed: true }))
      const plain = fitDecayRange({ suffixEnergy: suffixEnergySums(energy), endSample: energy.length, tailEnergy: 0 }, { sampleRateHz: entry.sampleRateHz, startDb: -5, endDb: -35 })
      const handled = bands.find((b) => b.centreHz === entry.band.nominalHz)?.T30 as number
      expect(handled, `${entry.band.nominalHz} Hz: ${handled} vs plain ${plain?.reverberationTimeS}`).toBeLessThan(0.9 * (plain?.reverberationTimeS as number))
    }
  })
})
