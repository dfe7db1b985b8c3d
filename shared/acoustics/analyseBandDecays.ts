import type { BandResolution, BandResult, DecayCurve } from '../types/analysis'
import { fractionalOctaveBands } from './bands/fractionalOctaveBands'
import { analyseDecay } from './decay/analyseDecay'
import { applySos } from './filters/applySos'
import { designBandFilter } from './filters/designBandFilter'

export interface AnalyseBandDecaysOptions {
  sampleRateHz: number
  onsetSample: number
  bands: BandResolution
  isTimeReversed: boolean
}

/** Samples kept before the onset when filtering forward, so the rise of the direct sound is whole. */
const PRE_ONSET_S = 0.005

/**
 * Per-band decay analysis: each IEC 61260-1 band (all that fit below 0.45·fs) is filtered with its
 * Butterworth band-pass (forward, or time-reversed per ISO 3382-2 7.3 NOTE), then analysed from the
 * broadband onset (ISO 3382-1 A.3.4: t = 0 from the broadband response, not per band).
 * Three work buffers are allocated once and reused for every band.
 */
export function analyseBandDecays(impulse: Float64Array, options: AnalyseBandDecaysOptions): { bands: BandResult[]; decays: DecayCurve[] } {
  const { sampleRateHz, onsetSample, isTimeReversed } = options
  const bandsPerOctave = options.bands === 'octave' ? 1 : 3
  const startSample = Math.max(0, onsetSample - Math.round(PRE_ONSET_S * sampleRateHz))
  const input = impulse.subarray(startSample)
  const skip = onsetSample - startSample
  const filtered = new Float64Array(input.length)
  const workspace = { energy: new Float64Array(input.length - skip), suffix: new Float64Array(input.length - skip + 1) }
  const bands: BandResult[] = []
  const decays: DecayCurve[] = []
  for (const band of fractionalOctaveBands({ bandsPerOctave, sampleRateHz })) {
    const { filter } = designBandFilter(band, bandsPerOctave, sampleRateHz)
    applySos(filter, input, { timeReversed: isTimeReversed, output: filtered })
    const { parameters, curve } = analyseDecay(filtered.subarray(skip), {
      sampleRateHz,
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
