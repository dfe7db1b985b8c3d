import { integratedEnergyAt, type IntegratedDecay } from './schroederIntegral'

export interface DecayFit {
  /** −60 / slope, s. */
  reverberationTimeS: number
  slopeDbPerS: number
  /** Line value at t = 0 (the onset), dB re E(0). */
  interceptDb: number
  r2: number
  /** First and last curve samples inside the evaluation range. */
  startSample: number
  endSample: number
}

/** Longest set of points a fit visits; beyond it the (smooth, integrated) curve is sampled uniformly. */
const MAX_FIT_POINTS = 8192

/** First sample in [low, high) with E[n] ≤ limit (E is non-increasing), or high if none. */
function firstAtOrBelow(decay: IntegratedDecay, limit: number, low: number, high: number): number {
  let lo = low
  let hi = high
  while (lo < hi) {
    const mid = (lo + hi) >>> 1
    if (integratedEnergyAt(decay, mid) <= limit) hi = mid
    else lo = mid + 1
  }
  return lo
}

/**
 * Least-squares line through the Schroeder curve L(t) = 10·lg(E(t)/E(0)) between two levels
 * (e.g. −5 and −35 dB for T30), over every curve sample inside the range (uniformly thinned to
 * ≤ 8192 points on long curves), extrapolated to 60 dB: T = −60/b.
 * @returns null when the curve does not reach `endDb` before the integration limit
 * @see ISO 3382-2:2008 Annex C (via transcription); ISO 3382-1:2009 A.2.2 (EDT 0 to −10 dB)
 */
export function fitDecayRange(decay: IntegratedDecay, options: { sampleRateHz: number; startDb: number; endDb: number }): DecayFit | null {
  const { sampleRateHz, startDb, endDb } = options
  const length = decay.endSample
  const startEnergy = integratedEnergyAt(decay, 0)
  if (!(startEnergy > 0)) return null
  const upperLimit = startEnergy * Math.pow(10, startDb / 10)
  const lowerLimit = startEnergy * Math.pow(10, endDb / 10)
  if (integratedEnergyAt(decay, length - 1) >= lowerLimit) return null
  const startSample = firstAtOrBelow(decay, upperLimit, 0, length)
  const endSample = firstAtOrBelow(decay, lowerLimit, startSample, length) - 1
  if (endSample - startSample < 2) return null
  const stride = Math.max(1, Math.ceil((endSample - startSample + 1) / MAX_FIT_POINTS))
  let count = 0
  let sumX = 0
  let sumY = 0
  let sumXX = 0
  let sumXY = 0
  let sumYY = 0
  // Offsets from the range start keep the sums well conditioned.
  for (let n = startSample; n <= endSample; n += stride) {
    const x = (n - startSample) / sampleRateHz
    const y = 10 * Math.log10(integratedEnergyAt(decay, n) / startEnergy)
    count++
    sumX += x
    sumY += y
    sumXX += x * x
    sumXY += x * y
    sumYY += y * y
  }
  const sxx = sumXX - (sumX * sumX) / count
  const sxy = sumXY - (sumX * sumY) / count
  const syy = sumYY - (sumY * sumY) / count
  const slope = sxy / sxx
  if (!(slope < 0)) return null
  const interceptAtStart = sumY / count - (slope * sumX) / count
  return {
    reverberationTimeS: -60 / slope,
    slopeDbPerS: slope,
    interceptDb: interceptAtStart - (slope * startSample) / sampleRateHz,
    r2: syy > 0 ? Math.min(1, (sxy * sxy) / (sxx * syy)) : 1,
    startSample,
    endSample,
  }
}
