export interface TrimImpulseOptions {
  sampleRateHz: number
  /** First sample to keep, e.g. the onset. */
  startSample: number
  /** Samples to keep before startSample (clamped at 0). Default 0. */
  preRollSamples?: number
  /** Longest result to keep, s; default: to the end. */
  maxDurationS?: number
}

/**
 * Copy of an impulse response from (startSample − preRoll) for at most maxDurationS.
 * The input is not modified.
 */
export function trimImpulse(impulse: Float64Array, options: TrimImpulseOptions): Float64Array {
  const { sampleRateHz, startSample, preRollSamples = 0, maxDurationS = Infinity } = options
  const begin = Math.max(0, Math.min(impulse.length, startSample - preRollSamples))
  const maxSamples = Number.isFinite(maxDurationS) ? Math.round(maxDurationS * sampleRateHz) : impulse.length
  return impulse.slice(begin, Math.min(impulse.length, begin + maxSamples))
}
