import type { DecayCurve, DecayParameters } from '../../types/analysis'
import { decayCurvaturePercent } from './curvature'
import { decayWarnings } from './decayWarnings'
import { computeEnergyParameters } from './energyParameters'
import { fitDecayRange, type DecayFit } from './fitDecayRange'
import { lundebyTruncation } from './lundebyTruncation'
import { sampleDecayCurve } from './sampleDecayCurve'
import { suffixEnergySums, type IntegratedDecay } from './schroederIntegral'
import { toEnergy } from './toEnergy'
import { uncertaintyT20, uncertaintyT30 } from './reverberationUncertainty'

export interface AnalyseDecayOptions {
  sampleRateHz: number
  /** Nominal band centre, or null for broadband. */
  centreHz: number | null
  /** Exact centre and filter bandwidth, Hz (band analysis only). */
  exactCentreHz?: number
  bandwidthHz?: number
  bandsPerOctave?: 1 | 3
  isTimeReversed: boolean
  /** Points in the decimated curve. Default 400. */
  curvePointCount?: number
  /** Reusable buffers of length ≥ N (energy) and N + 1 (suffix sums). */
  workspace?: { energy: Float64Array; suffix: Float64Array }
}

/** Initial Lundeby window: 30 ms broadband; 10–50 ms for bands, longer at low frequencies. */
function initialWindowS(centreHz: number | null): number {
  return centreHz === null ? 0.03 : Math.min(0.05, Math.max(0.01, 25 / centreHz))
}

const fitLine = (fit: DecayFit | null, sampleRateHz: number) =>
  fit === null
    ? null
    : [fit.startSample, fit.endSample].flatMap((n) => [(1000 * n) / sampleRateHz, fit.interceptDb + (fit.slopeDbPerS * n) / sampleRateHz])

/**
 * Full ISO 3382 decay analysis of one (band-filtered or broadband) response that starts at the
 * onset: energy → Lundeby truncation and compensation → Schroeder curve → EDT (0/−10 dB),
 * T20 (−5/−25), T30 (−5/−35) → C50, C80, D50, Ts → curvature, uncertainty, validity flags.
 * @param response samples from the onset (t = 0) to the end
 */
export function analyseDecay(response: Float64Array, options: AnalyseDecayOptions): { parameters: DecayParameters; curve: DecayCurve } {
  const { sampleRateHz, centreHz, isTimeReversed } = options
  const count = response.length
  const energy = toEnergy(response, options.workspace?.energy.subarray(0, count))
  const suffix = suffixEnergySums(energy, options.workspace?.suffix.subarray(0, count + 1))
  // Windows ≥ 3/B keep band levels steady enough to fit (3 independent samples; common practice).
  const minWindowS = options.bandwidthHz ? 3 / options.bandwidthHz : 0
  const lundeby = lundebyTruncation(energy, suffix, { sampleRateHz, initialWindowS: initialWindowS(centreHz), minWindowS })
  const decay: IntegratedDecay = { suffixEnergy: suffix, endSample: lundeby.truncationSample, tailEnergy: lundeby.tailEnergy }
  const fits = {
    EDT: fitDecayRange(decay, { sampleRateHz, startDb: 0, endDb: -10 }),
    T20: fitDecayRange(decay, { sampleRateHz, startDb: -5, endDb: -25 }),
    T30: fitDecayRange(decay, { sampleRateHz, startDb: -5, endDb: -35 }),
  }
  const decayRatePerS = lundeby.lateDecayDbPerS === null ? 0 : (-lundeby.lateDecayDbPerS * Math.LN10) / 10
  const energyParameters = computeEnergyParameters(energy, decay, { sampleRateHz, decayRatePerS })
  const startEnergy = suffix[0] as number
  let peakEnergy = 0
  for (let i = 0; i < count; i++) peakEnergy = Math.max(peakEnergy, energy[i] as number)
  const E0 = decay.tailEnergy + startEnergy - (suffix[decay.endSample] as number)
  const endEnergy = decay.tailEnergy + (suffix[decay.endSample - 1] as number) - (suffix[decay.endSample] as number)
  const decayRangeDb = 10 * Math.log10(E0 / endEnergy)
  const T20 = fits.T20?.reverberationTimeS ?? null
  const T30 = fits.T30?.reverberationTimeS ?? null
  const EDT = fits.EDT?.reverberationTimeS ?? null
  const curvaturePercent = T20 !== null && T30 !== null ? decayCurvaturePercent(T20, T30) : null
  const band = options.exactCentreHz !== undefined && options.bandsPerOctave !== undefined ? { centreHz: options.exactCentreHz, bandsPerOctave: options.bandsPerOctave } : null
  const fitR2 = { T20: fits.T20?.r2 ?? null, T30: fits.T30?.r2 ?? null, EDT: fits.EDT?.r2 ?? null }
  const parameters: DecayParameters = {
    T20,
    T30,
    EDT,
    ...energyParameters,
    decayRangeDb,
    peakToNoiseDb: lundeby.noisePower > 0 ? 10 * Math.log10(peakEnergy / lundeby.noisePower) : null,
    curvaturePercent,
    uncertaintyT20: band && T20 !== null ? uncertaintyT20({ reverberationTimeS: T20, ...band }) : null,
    uncertaintyT30: band && T30 !== null ? uncertaintyT30({ reverberationTimeS: T30, ...band }) : null,
    fitR2,
    warnings: decayWarnings({
      EDT, T20, T30, fitR2, decayRangeDb, curvaturePercent,
      bandwidthHz: options.bandwidthHz ?? null,
      isTimeReversed,
      isNoiseFloorFound: lundeby.isReliable,
    }),
  }
  const curve: DecayCurve = {
    centreHz,
    ...sampleDecayCurve(decay, { sampleRateHz, pointCount: options.curvePointCount ?? 400 }),
    fits: { EDT: fitLine(fits.EDT, sampleRateHz), T20: fitLine(fits.T20, sampleRateHz), T30: fitLine(fits.T30, sampleRateHz) },
    truncationMs: lundeby.isReliable ? (1000 * lundeby.truncationSample) / sampleRateHz : null,
  }
  return { parameters, curve }
}
