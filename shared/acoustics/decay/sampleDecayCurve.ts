import { integratedEnergyAt, type IntegratedDecay } from './schroederIntegral'

/**
 * The Schroeder curve decimated for charts: `pointCount` samples evenly spaced from the onset to
 * the integration limit, in dB re E(0) against ms from the onset (never the raw sample array).
 */
export function sampleDecayCurve(decay: IntegratedDecay, options: { sampleRateHz: number; pointCount: number }): { timeMs: number[]; levelDb: number[] } {
  const { sampleRateHz } = options
  const last = decay.endSample - 1
  const pointCount = Math.max(2, Math.min(options.pointCount, decay.endSample))
  const startEnergy = integratedEnergyAt(decay, 0)
  const timeMs: number[] = []
  const levelDb: number[] = []
  for (let p = 0; p < pointCount; p++) {
    const sample = Math.round((p * last) / (pointCount - 1))
    timeMs.push(Math.round((1e6 * sample) / sampleRateHz) / 1000)
    levelDb.push(Math.round(1000 * 10 * Math.log10(Math.max(integratedEnergyAt(decay, sample), 1e-300) / startEnergy)) / 1000)
  }
  return { timeMs, levelDb }
}
