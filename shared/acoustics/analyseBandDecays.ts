import type { BandResolution, BandResult, DecayCurve } from '../types/analysis'
import { fractionalOctaveBands } from './bands/fractionalOctaveBands'
import { analyseDecay } from './decay/analyseDecay'
import { applySos } from './filters/applySos'
import { decimateByTwo } from './filters/decimateByTwo'
import { designBandFilterBank } from './filters/designBandFilterBank'

export interface AnalyseBandDecaysOptions {
  sampleRateHz: number
  onsetSample: number
  bands: BandResolution
  isTimeReversed: boolean
}

/** Samples kept before the onset, so the rise of the direct sound and the decimators' reach are whole. */
const PRE_ONSET_S = 0.005

/**
 * Per-band decay analysis: each IEC 61260-1 band (all that fit below 0.45·fs) is filtered with its
 * Butterworth band-pass (forward, or time-reversed per ISO 3382-2 7.3 NOTE) — low bands after
 * zero-phase decimation (designBandFilterBank) — and analysed from the broadband onset
 * (ISO 3382-1 A.3.4: t = 0 from the broadband response, not per band). Forward filtering moves band
 * energy late by the filter's delay, time-reversed filtering moves it early; C80 and D50 of a band
 * can differ by about 1 dB / 0.05 between the two (e.g. BRAS CR2, 800 Hz third). The pre-onset margin is a
 * multiple of the largest decimation factor, so the onset falls on a whole sample at every rate.
 * Work buffers are allocated once and reused for every band.
 */
export function analyseBandDecays(impulse: Float64Array, options: AnalyseBandDecaysOptions): { bands: BandResult[]; decays: DecayCurve[] } {
  const { sampleRateHz, onsetSample, isTimeReversed } = options
  const bandsPerOctave = options.bands === 'octave' ? 1 : 3
  const bank = designBandFilterBank(fractionalOctaveBands({ bandsPerOctave, sampleRateHz }), bandsPerOctave, sampleRateHz)
  const step = bank.maxDecimationFactor
  const skip = step * Math.floor(Math.min(onsetSample, Math.round(PRE_ONSET_S * sampleRateHz)) / step)
  const levels = new Map<number, Float64Array>([[1, impulse.subarray(onsetSample - skip)]])
  const levelFor = (factor: number): Float64Array => {
    const cached = levels.get(factor)
    if (cached) return cached
    const decimated = decimateByTwo(levelFor(factor / 2), bank.halfBandTaps)
    levels.set(factor, decimated)
    return decimated
  }
  const fullLength = impulse.length - onsetSample + skip
  const filtered = new Float64Array(fullLength)
  const workspace = { energy: new Float64Array(fullLength), suffix: new Float64Array(fullLength + 1) }
  const bands: BandResult[] = []
  const decays: DecayCurve[] = []
  for (const entry of bank.bands) {
    const input = levelFor(entry.decimationFactor)
    const output = applySos(entry.filter, input, { timeReversed: isTimeReversed, output: filtered })
    const start = skip / entry.decimationFactor
    const { band } = entry
    const { parameters, curve } = analyseDecay(output.subarray(start), {
      sampleRateHz: entry.sampleRateHz,
      centreHz: band.nominalHz,
      exactCentreHz: band.exactCentreHz,
      bandwidthHz: band.bandwidthHz,
      bandsPerOctave,
      isTimeReversed,
      workspace,
    })
    bands.push({ centreHz: band.nominalHz, exactCentreHz: band.exactCentreHz, ...parameters })
    decays.push(curve)
  }
  return { bands, decays }
}
