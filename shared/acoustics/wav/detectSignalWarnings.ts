import type { AnalysisWarning } from '../../types/analysis'

/** |x| at or above this counts as full scale (common practice, no source). */
const FULL_SCALE = 0.999
/** A run this long at full scale is taken as clipping; a single full-scale peak of a normalised IR is not. */
const CLIP_RUN_SAMPLES = 3
/** |mean| above −60 dBFS is reported as a DC offset (common practice, no source). */
const DC_OFFSET_LIMIT = 0.001

/**
 * Warnings for a decoded channel: clipping (runs of ≥ 3 samples at |x| ≥ 0.999 of full scale)
 * and DC offset (|mean| > 0.001 = −60 dBFS). Both are reported, never fatal.
 */
export function detectSignalWarnings(samples: Float64Array): AnalysisWarning[] {
  let sum = 0
  let run = 0
  let clippedRuns = 0
  for (let i = 0; i < samples.length; i++) {
    const value = samples[i] as number
    sum += value
    if (Math.abs(value) >= FULL_SCALE) {
      run++
      if (run === CLIP_RUN_SAMPLES) clippedRuns++
    } else {
      run = 0
    }
  }
  const warnings: AnalysisWarning[] = []
  if (clippedRuns > 0) {
    warnings.push({
      code: 'clipping',
      parameters: [],
      message: `The recording clips (${clippedRuns} run(s) of full-scale samples); lower the playback or input level and measure again.`,
    })
  }
  const mean = sum / samples.length
  if (Math.abs(mean) > DC_OFFSET_LIMIT) {
    warnings.push({
      code: 'dc-offset',
      parameters: [],
      message: `The recording has a DC offset of ${(20 * Math.log10(Math.abs(mean))).toFixed(1)} dBFS; check the audio interface.`,
    })
  }
  return warnings
}
