import type { AnalysisResult } from '../types/analysis'

/** The mid-band figures a captures list shows, stored as columns of the analysis by the worker. */
export interface AnalysisHeadline {
  T30S: number | null
  T20S: number | null
  EDTS: number | null
  C80Db: number | null
}

/**
 * Mean of a parameter over the mid-band: the 500 Hz and 1 kHz octaves, or the thirds from 400 Hz
 * to 1.25 kHz (the usual single-number average of room parameters; common practice).
 */
function midBand(result: AnalysisResult, parameter: 'T30' | 'T20' | 'EDT' | 'C80'): number | null {
  const values = result.bands
    .filter((band) => band.centreHz >= 355 && band.centreHz <= 1413)
    .map((band) => band[parameter])
    .filter((value): value is number => value !== null && Number.isFinite(value))
  return values.length === 0 ? null : values.reduce((sum, value) => sum + value, 0) / values.length
}

export function headlineOf(result: AnalysisResult): AnalysisHeadline {
  return { T30S: midBand(result, 'T30'), T20S: midBand(result, 'T20'), EDTS: midBand(result, 'EDT'), C80Db: midBand(result, 'C80') }
}
