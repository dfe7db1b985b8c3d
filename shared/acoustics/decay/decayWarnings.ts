import type { AnalysisWarning } from '../../types/analysis'
import { minimumReverberationTimeS } from './bandwidthTimeProduct'
import { CURVATURE_LIMIT_PERCENT } from './curvature'

export interface DecayWarningInputs {
  EDT: number | null
  T20: number | null
  T30: number | null
  fitR2: { EDT: number | null; T20: number | null; T30: number | null }
  decayRangeDb: number | null
  curvaturePercent: number | null
  /** Filter bandwidth, Hz; null for broadband (no filter ringing). */
  bandwidthHz: number | null
  isTimeReversed: boolean
  /** False when the decay could not be told apart from the noise. */
  isNoiseFloorFound: boolean
}

/** r² below this marks a poor fit (common practice, no source). */
const MIN_R2 = 0.95
/** Decay range each parameter needs: evaluation range + 15 dB (ISO 3382-1:2009 5.3.3, facts §1.5). */
const NEEDED_RANGE_DB = { EDT: 25, T20: 35, T30: 45 } as const
const RANGE_CODES = { EDT: 'decay-range-edt', T20: 'decay-range-t20', T30: 'decay-range-t30' } as const
const TIMES = ['EDT', 'T20', 'T30'] as const

function rangeWarnings(inputs: DecayWarningInputs): AnalysisWarning[] {
  const range = inputs.decayRangeDb ?? 0
  return TIMES.filter((name) => range < NEEDED_RANGE_DB[name]).map((name) => ({
    code: RANGE_CODES[name],
    parameters: [name],
    message: `${name} needs ${NEEDED_RANGE_DB[name]} dB of decay above the noise; this band has ${range.toFixed(1)} dB.`,
  }))
}

/**
 * Validity flags per ISO 3382-2 for one decay; they qualify values and never remove them.
 * Decay range (ISO 3382-1 5.3.3), B·T (ISO 3382-2 7.3), curvature > 10 % (Annex B.3),
 * r² < 0.95 (common practice), nothing to fit, no noise floor separable from the decay.
 */
export function decayWarnings(inputs: DecayWarningInputs): AnalysisWarning[] {
  const warnings = rangeWarnings(inputs)
  if (inputs.bandwidthHz !== null) {
    const minimumS = minimumReverberationTimeS(inputs.bandwidthHz, inputs.isTimeReversed)
    const failing = TIMES.filter((name) => inputs[name] !== null && (inputs[name] as number) < minimumS)
    if (failing.length > 0) {
      warnings.push({
        code: 'bandwidth-time-product',
        parameters: failing,
        message: `Below ${minimumS.toFixed(3)} s the band filter's own ringing limits the result (B·T < ${inputs.isTimeReversed ? 4 : 16}).`,
      })
    }
  }
  if (inputs.curvaturePercent !== null && inputs.curvaturePercent > CURVATURE_LIMIT_PERCENT) {
    warnings.push({
      code: 'curvature',
      parameters: ['T20', 'T30'],
      message: `The decay is curved (C = ${inputs.curvaturePercent.toFixed(1)} % > 10 %): T20 and T30 disagree, e.g. a double-slope decay.`,
    })
  }
  const poor = TIMES.filter((name) => inputs.fitR2[name] !== null && (inputs.fitR2[name] as number) < MIN_R2)
  if (poor.length > 0) {
    warnings.push({ code: 'poor-fit', parameters: poor, message: 'The decay is not a straight line over the evaluation range (r² < 0.95).' })
  }
  if (TIMES.every((name) => inputs[name] === null)) {
    warnings.push({ code: 'no-decay', parameters: [...TIMES], message: 'No decay could be fitted in this band.' })
  }
  if (!inputs.isNoiseFloorFound) {
    warnings.push({ code: 'low-snr', parameters: [], message: 'The decay could not be separated from the background noise (less than 20 dB above it).' })
  }
  return warnings
}
