import type { BandResult } from '../types/analysis'
import { uncertaintyT20, uncertaintyT30 } from './decay/reverberationUncertainty'

export const AVERAGED_PARAMETERS = ['T20', 'T30', 'EDT', 'C50', 'C80', 'D50', 'Ts'] as const
export type AveragedParameter = (typeof AVERAGED_PARAMETERS)[number]

/** Mean and spread of one parameter over the positions that have a value. */
export interface ParameterSpread {
  mean: number | null
  /** Sample standard deviation (n − 1); null below two values. */
  standardDeviation: number | null
  min: number | null
  max: number | null
  /** Positions with a value (null values are left out, never counted as zero). */
  count: number
}

export interface SpatialAverageBand {
  centreHz: number
  parameters: Record<AveragedParameter, ParameterSpread>
  /** ISO 3382-2 Annex A σ of the mean T20/T30 with N = count positions (needs bandsPerOctave). */
  uncertaintyT20: number | null
  uncertaintyT30: number | null
}

function spreadOf(values: number[]): ParameterSpread {
  const count = values.length
  if (count === 0) return { mean: null, standardDeviation: null, min: null, max: null, count }
  const mean = values.reduce((sum, value) => sum + value, 0) / count
  const variance = count > 1 ? values.reduce((sum, value) => sum + (value - mean) ** 2, 0) / (count - 1) : null
  return { mean, standardDeviation: variance === null ? null : Math.sqrt(variance), min: values.reduce((low, value) => Math.min(low, value)), max: values.reduce((high, value) => Math.max(high, value)), count }
}

/**
 * Spatial average of a survey: per band, the arithmetic mean, sample standard deviation, min and
 * max of each parameter over the positions (ISO 3382-2:2008 cl. 8 averages T over positions;
 * averaging C and D arithmetically as well is common practice). Bands are matched by centreHz.
 * @param positions one BandResult[] per source–receiver position
 */
export function spatialAverage(positions: BandResult[][], options: { bandsPerOctave?: 1 | 3 } = {}): SpatialAverageBand[] {
  const centres = [...new Set(positions.flatMap((bands) => bands.map((band) => band.centreHz)))].sort((a, b) => a - b)
  return centres.map((centreHz) => {
    const matches = positions.flatMap((bands) => bands.filter((band) => band.centreHz === centreHz))
    const parameters = Object.fromEntries(
      AVERAGED_PARAMETERS.map((name) => [name, spreadOf(matches.map((band) => band[name]).filter((value): value is number => value !== null))]),
    ) as Record<AveragedParameter, ParameterSpread>
    const sigma = (name: 'T20' | 'T30', formula: typeof uncertaintyT20) => {
      const { mean, count } = parameters[name]
      if (mean === null || options.bandsPerOctave === undefined) return null
      return formula({ reverberationTimeS: mean, centreHz, bandsPerOctave: options.bandsPerOctave, positionCount: count })
    }
    return { centreHz, parameters, uncertaintyT20: sigma('T20', uncertaintyT20), uncertaintyT30: sigma('T30', uncertaintyT30) }
  })
}
