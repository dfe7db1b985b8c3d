import { harmonicDelayS } from './sweepRate'

export interface HarmonicWindow {
  order: number
  /** The k-th order response, starting `preSamples` before its peak. */
  impulse: Float64Array
  /** The linear response over the same span re its own peak, for level comparisons. */
  linear: Float64Array
  preSamples: number
}

export interface SeparatedResponses {
  /** The linear impulse response (causal part, a short pre-roll kept before it). */
  impulse: Float64Array
  /** Index in `impulse` of the nominal time zero (the start of the sweep as played). */
  timeZeroSample: number
  harmonics: HarmonicWindow[]
}

/**
 * Pre-roll kept before the linear peak or time zero, s: the band-limited response rings before its
 * peak at the sweep's low edge, and cutting that ringing short would bend the response below
 * ~100 Hz (common practice, no source; 50 ms keeps the error under 0.3 dB above 30 Hz here).
 */
const PRE_ROLL_S = 0.05
/** Largest share of the gap to the next higher order that a harmonic window may start before its peak. */
const HARMONIC_PRE_SHARE = 0.25

/**
 * Splits a deconvolved sweep recording into the linear impulse response and the harmonic
 * responses that sit Δt_k = L·ln k before it (Farina 2000; ISO 18233:2006 B.5: keep the causal
 * part, window out the pre-response).
 *
 * The linear response starts 50 ms (at most half the gap to order 2) before the earlier of the
 * nominal time zero and the largest peak (so latency or an early recording start cannot cut the
 * direct sound) and ends `tailSamples` after time zero. The k-th window runs from 50 ms (at most a
 * quarter of the gap to order k + 1) before the k-th peak to the start of order k − 1's window. Without a sweep rate (an unknown
 * reference sweep) only the linear response is kept.
 * @param deconvolved - the linear deconvolution output
 * @param zeroIndex - index in `deconvolved` of the nominal time zero
 */
export function separateHarmonics(
  deconvolved: Float64Array,
  options: { zeroIndex: number; sampleRateHz: number; sweepRateS: number | null; tailSamples: number; maxOrder: number },
): SeparatedResponses {
  const { zeroIndex, sampleRateHz, sweepRateS, tailSamples, maxOrder } = options
  let peak = 0
  for (let i = 1; i < deconvolved.length; i++) {
    if (Math.abs(deconvolved[i] as number) > Math.abs(deconvolved[peak] as number)) peak = i
  }
  const halfGap = sweepRateS === null ? Infinity : Math.floor(0.5 * harmonicDelayS(sweepRateS, 2) * sampleRateHz)
  const preRoll = Math.min(Math.round(PRE_ROLL_S * sampleRateHz), halfGap)
  const anchor = peak - zeroIndex < halfGap ? Math.min(zeroIndex, peak) : peak
  const start = Math.max(0, anchor - preRoll)
  const end = Math.min(deconvolved.length, Math.max(zeroIndex + tailSamples, peak + Math.round(0.1 * sampleRateHz)))
  const result: SeparatedResponses = { impulse: deconvolved.slice(start, end), timeZeroSample: zeroIndex - start, harmonics: [] }
  if (sweepRateS === null) return result
  let windowEnd = start
  for (let order = 2; order <= maxOrder; order++) {
    const centre = peak - Math.round(harmonicDelayS(sweepRateS, order) * sampleRateHz)
    const gapToNext = Math.log((order + 1) / order) * sweepRateS * sampleRateHz
    const preSamples = Math.min(Math.round(PRE_ROLL_S * sampleRateHz), Math.floor(HARMONIC_PRE_SHARE * gapToNext))
    const windowStart = centre - preSamples
    if (windowStart < 0 || windowEnd - windowStart < 2 * preSamples + 16) break
    const length = windowEnd - windowStart
    const linearStart = peak - preSamples
    result.harmonics.push({
      order,
      impulse: deconvolved.slice(windowStart, windowEnd),
      linear: deconvolved.slice(linearStart, Math.min(deconvolved.length, linearStart + length)),
      preSamples,
    })
    windowEnd = windowStart
  }
  return result
}
