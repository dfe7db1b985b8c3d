import { linearFit } from '../linearFit'
import { meanEnergyFrom, windowLevels, type WindowLevels } from './windowLevels'

export interface LundebyOptions {
  sampleRateHz: number
  /** First averaging window, s (10–50 ms; longer for low bands). */
  initialWindowS: number
  /**
   * Shortest window in the later passes, s. A band-limited level of bandwidth B fluctuates by
   * several dB in windows shorter than a few 1/B; default 0 (broadband).
   */
  minWindowS?: number
}

export interface LundebyResult {
  /** Integration limit t1 (exclusive), samples from the onset, 1 … N. */
  truncationSample: number
  /** Tail compensation C = P̄·fs/k in sample-energy units (0 when aborted). */
  tailEnergy: number
  /** Mean noise energy per sample (the level the decay line meets at t1). */
  noisePower: number
  /** Slope of the late decay, dB/s (negative), or null when aborted. */
  lateDecayDbPerS: number | null
  /** False when the decay could not be separated from the noise (too little range). */
  isReliable: boolean
  iterations: number
}

const MARGIN_ABOVE_NOISE_DB = 10
const LATE_RANGE_DB = 20
const INTERVALS_PER_10_DB = 5
const MAX_ITERATIONS = 10
/** Fewest windows a late-decay fit may use; fewer keeps the previous estimate (common practice). */
const MIN_LATE_WINDOWS = 3

/** Window index range [first ≤ topDb after the peak, first ≤ bottomDb after that). */
function rangeBetween(levels: WindowLevels, topDb: number, bottomDb: number): [number, number] {
  const level = levels.levelDb
  let peak = 0
  for (let i = 1; i < level.length; i++) if ((level[i] as number) > (level[peak] as number)) peak = i
  let start = peak
  while (start < level.length && (level[start] as number) > topDb) start++
  if (start === level.length) start = peak
  let end = start + 1
  while (end < level.length && (level[end] as number) > bottomDb) end++
  return [start, end]
}

function fitWindows(levels: WindowLevels, [start, end]: [number, number], minCount: number) {
  if (end - start < minCount) return null
  const fit = linearFit(levels.timeS.subarray(start, end), levels.levelDb.subarray(start, end))
  return fit.slope < 0 ? fit : null
}

/**
 * Noise-floor truncation point and tail compensation after Lundeby, Vigran, Bietz & Vorländer,
 * Acustica 81 (1995) 344–355 (facts §2.1): noise from the last 10 %; regression from the peak to
 * 10 dB above the noise; crosspoint with the noise; then, with 5 windows per 10 dB, re-estimate the
 * noise 10 dB of decay past the crosspoint (at least the last 10 %), fit the late decay over 20 dB
 * ending 10 dB above the noise, and iterate until the crosspoint moves < 1 ms (≤ 10 passes).
 * Windows are kept ≥ minWindowS and a late fit needs ≥ 3 windows, else the previous line stands.
 * C = P̄·T_late/(6 ln 10) (ISO 3382-1:2009 5.3.3 Eq. (3)); here P̄·fs/k with k = |slope|·ln10/10.
 * Aborts (isReliable = false, t1 = N, C = 0) when the peak is < 20 dB above the noise.
 * @param energy p²[n] from the onset; @param suffixEnergy its suffix sums (length N + 1)
 */
export function lundebyTruncation(energy: Float64Array, suffixEnergy: Float64Array, options: LundebyOptions): LundebyResult {
  const { sampleRateHz, initialWindowS, minWindowS = 0 } = options
  const sampleCount = energy.length
  const durationS = sampleCount / sampleRateHz
  const lastTenthStart = Math.floor(0.9 * sampleCount)
  let noisePower = meanEnergyFrom(suffixEnergy, lastTenthStart)
  let noiseDb = 10 * Math.log10(Math.max(noisePower, 1e-300))
  let levels = windowLevels(suffixEnergy, Math.max(1, Math.round(initialWindowS * sampleRateHz)), sampleRateHz)
  const aborted: LundebyResult = { truncationSample: sampleCount, tailEnergy: 0, noisePower, lateDecayDbPerS: null, isReliable: false, iterations: 0 }
  // A loop, not Math.max(...levels): a long recording has more windows than the call stack holds.
  let peakDb = -Infinity
  for (const level of levels.levelDb) if (level > peakDb) peakDb = level
  let fit = fitWindows(levels, rangeBetween(levels, Infinity, noiseDb + MARGIN_ABOVE_NOISE_DB), 2)
  if (!fit || peakDb - noiseDb < 2 * MARGIN_ABOVE_NOISE_DB) return aborted
  let crossS = Math.min(durationS, (noiseDb - fit.intercept) / fit.slope)
  let iterations = 0
  while (iterations < MAX_ITERATIONS) {
    iterations++
    const tenDbS = MARGIN_ABOVE_NOISE_DB / Math.abs(fit.slope)
    const noiseStart = Math.min(lastTenthStart, Math.round((crossS + tenDbS) * sampleRateHz))
    noisePower = meanEnergyFrom(suffixEnergy, Math.max(0, noiseStart))
    noiseDb = 10 * Math.log10(Math.max(noisePower, 1e-300))
    const windowS = Math.max(minWindowS, tenDbS / INTERVALS_PER_10_DB)
    const windowSamples = Math.max(1, Math.round(windowS * sampleRateHz))
    levels = windowLevels(suffixEnergy, windowSamples, sampleRateHz)
    const bottomDb = noiseDb + MARGIN_ABOVE_NOISE_DB
    const next = fitWindows(levels, rangeBetween(levels, bottomDb + LATE_RANGE_DB, bottomDb), MIN_LATE_WINDOWS)
    if (!next) break
    fit = next
    const nextCrossS = Math.min(durationS, (noiseDb - fit.intercept) / fit.slope)
    const hasConverged = Math.abs(nextCrossS - crossS) < 0.001
    crossS = nextCrossS
    if (hasConverged) break
  }
  const truncationSample = Math.max(1, Math.min(sampleCount, Math.round(crossS * sampleRateHz)))
  const decayRatePerS = (Math.abs(fit.slope) * Math.LN10) / 10
  return {
    truncationSample,
    tailEnergy: (noisePower * sampleRateHz) / decayRatePerS,
    noisePower,
    lateDecayDbPerS: fit.slope,
    isReliable: true,
    iterations,
  }
}
