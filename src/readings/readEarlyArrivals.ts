import type { BandResult } from '@shared/types/analysis'
import { formatMeasure } from '@/utils/formatMeasure'
import { midBandMean } from './midBandMean'
import { signedDbText, type ChartReading } from './chartReading'

interface EnergyTime {
  timeMs: readonly number[]
  levelDb: readonly number[]
}

/** Window searched for the direct sound around the onset (t = 0), ms. */
const DIRECT_WINDOW_MS: [number, number] = [-1, 2.5]
/** Early reflections: peaks from 1.5 ms after the direct sound up to the C80 limit, ms. */
const GAP_AFTER_DIRECT_MS = 1.5
const EARLY_LIMIT_MS = 80

function strongestIn(curve: EnergyTime, isInside: (timeMs: number, index: number) => boolean): number {
  let best = -1
  curve.timeMs.forEach((timeMs, i) => {
    const levelDb = curve.levelDb[i] as number
    if (Number.isFinite(levelDb) && isInside(timeMs, i) && (best < 0 || levelDb > (curve.levelDb[best] as number))) best = i
  })
  return best
}

function isLocalPeak(curve: EnergyTime, i: number): boolean {
  const level = curve.levelDb[i] as number
  return level >= (curve.levelDb[i - 1] ?? -Infinity) && level >= (curve.levelDb[i + 1] ?? -Infinity)
}

/** Reads the energy-time curve (times from the onset) and the mid-band clarity C80 / C50. */
export function readEarlyArrivals(curve: EnergyTime, bands: readonly BandResult[]): ChartReading {
  const direct = strongestIn(curve, (t) => t >= DIRECT_WINDOW_MS[0] && t <= DIRECT_WINDOW_MS[1])
  const directIndex = direct >= 0 ? direct : strongestIn(curve, () => true)
  let first: string
  if (directIndex < 0) {
    first = 'This analysis has no energy-time curve.'
  } else {
    const directMs = curve.timeMs[directIndex] as number
    const directDb = curve.levelDb[directIndex] as number
    const reflection = strongestIn(curve, (t, i) => t > directMs + GAP_AFTER_DIRECT_MS && t <= EARLY_LIMIT_MS && isLocalPeak(curve, i))
    first = reflection < 0
      ? 'No distinct reflection stands out in the first 80 ms.'
      : `The strongest early reflection arrives ${formatMeasure((curve.timeMs[reflection] as number) - directMs, 1, 'ms')} after the direct sound, ${signedDbText((curve.levelDb[reflection] as number) - directDb)} relative to it.`
  }
  const c80 = midBandMean(bands, 'C80')
  const c50 = midBandMean(bands, 'C50')
  if (c80 === null) return [first, 'Mid-band clarity (C80) could not be computed for this capture.']
  const balance = c80 >= 0 ? 'more sound energy arrives in the first 80 ms than after it' : 'less sound energy arrives in the first 80 ms than after it'
  const c50Text = c50 === null ? '' : ` and C50 ${formatMeasure(c50, 1, 'dB')}`
  return [first, `Mid-band C80 is ${formatMeasure(c80, 1, 'dB')}${c50Text}: ${balance}.`]
}
