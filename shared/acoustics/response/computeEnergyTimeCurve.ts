import { DspInputError } from '../errors'
import { hilbertTransform } from '../fft/hilbertTransform'
import { validateSignal } from '../validateSignal'
import { validateOnset } from './validateOnset'

export interface EnergyTimeCurveOptions {
  sampleRateHz: number
  /** Sample taken as t = 0 (the ISO 3382-1 onset). */
  onsetSample: number
  /** Most points returned; longer curves are decimated keeping each bucket's maximum. Default 3000. */
  maxPoints?: number
}

export interface EnergyTimeCurve {
  /** Time of each point from the onset, ms (negative before it). */
  timeMs: number[]
  /** ETC level re its maximum, dB (≤ 0). */
  levelDb: number[]
}

const DEFAULT_MAX_POINTS = 3000
/** Lowest level reported, dB re peak; below this the curve is clamped (keeps JSON finite). */
const FLOOR_DB = -200

/**
 * Energy-time curve: ETC(t) = 10·lg((h² + H{h}²)/max) dB, the squared magnitude of the analytic
 * signal h + j·H{h} re its maximum (acoustics-facts §5; Hilbert transform as in the
 * scipy.signal.hilbert documentation).
 *
 * Longer curves are cut into `maxPoints` equal buckets and each bucket is represented by its
 * loudest sample, at that sample's own time, so isolated reflections survive decimation and the
 * peak keeps its exact time (the times are then increasing but not evenly spaced).
 * @param impulse - impulse response (not modified)
 * @returns decimated curve, ≤ maxPoints points
 */
export function computeEnergyTimeCurve(impulse: Float64Array, options: EnergyTimeCurveOptions): EnergyTimeCurve {
  const { sampleRateHz, onsetSample, maxPoints = DEFAULT_MAX_POINTS } = options
  validateSignal(impulse, { sampleRateHz, label: 'impulse response' })
  validateOnset(onsetSample, impulse.length)
  if (!Number.isInteger(maxPoints) || maxPoints < 2) {
    throw new DspInputError('bad-point-count', `maxPoints must be a whole number of at least 2 (got ${maxPoints}).`)
  }
  const quadrature = hilbertTransform(impulse)
  const energy = new Float64Array(impulse.length)
  let peakEnergy = 0
  for (let i = 0; i < impulse.length; i++) {
    const h = impulse[i] as number
    const q = quadrature[i] as number
    const e = h * h + q * q
    energy[i] = e
    if (e > peakEnergy) peakEnergy = e
  }
  const bucketCount = Math.min(maxPoints, impulse.length)
  const timeMs: number[] = new Array(bucketCount)
  const levelDb: number[] = new Array(bucketCount)
  const msPerSample = 1000 / sampleRateHz
  for (let b = 0; b < bucketCount; b++) {
    const start = Math.floor((b * impulse.length) / bucketCount)
    const end = Math.floor(((b + 1) * impulse.length) / bucketCount)
    let best = start
    for (let i = start + 1; i < end; i++) if ((energy[i] as number) > (energy[best] as number)) best = i
    timeMs[b] = (best - onsetSample) * msPerSample
    const ratio = (energy[best] as number) / peakEnergy
    levelDb[b] = ratio > 0 ? Math.max(FLOOR_DB, 10 * Math.log10(ratio)) : FLOOR_DB
  }
  return { timeMs, levelDb }
}
