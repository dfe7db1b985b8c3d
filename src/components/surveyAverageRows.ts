import type { SurveyBandReading } from '@shared/api'
import type { AveragedParameter, ParameterSpread, SpatialAverageBand } from '@shared/acoustics/spatialAverage'
import { formatFrequencyHz } from './charts/frequencyTicks'
import { formatMeasure } from '@/utils/formatMeasure'

export interface SurveyAverageColumn {
  key: AveragedParameter
  title: string
  decimals: number
  /** Stored → displayed (D50 fraction → %, Ts s → ms). */
  scale: number
}

export const SURVEY_AVERAGE_COLUMNS: readonly SurveyAverageColumn[] = [
  { key: 'T30', title: 'T30 (s)', decimals: 2, scale: 1 },
  { key: 'T20', title: 'T20 (s)', decimals: 2, scale: 1 },
  { key: 'EDT', title: 'EDT (s)', decimals: 2, scale: 1 },
  { key: 'C50', title: 'C50 (dB)', decimals: 1, scale: 1 },
  { key: 'C80', title: 'C80 (dB)', decimals: 1, scale: 1 },
  { key: 'D50', title: 'D50 (%)', decimals: 0, scale: 100 },
  { key: 'Ts', title: 'Ts (ms)', decimals: 0, scale: 1000 },
]

export interface SurveyAverageRow {
  centreHz: number
  bandLabel: string
  cells: Record<AveragedParameter, string>
  /** Why the band's reverberation time is not trusted; null when it is. */
  note: string | null
}

/** "0.42 ± 0.03 (4)": mean ± sample standard deviation (positions); "—" when there is no value. */
export function formatSpread(spread: ParameterSpread, decimals: number, scale = 1): string {
  if (spread.mean === null) return formatMeasure(null, decimals)
  const mean = formatMeasure(spread.mean * scale, decimals)
  const sd = spread.standardDeviation === null ? '' : ` ± ${formatMeasure(spread.standardDeviation * scale, decimals)}`
  return `${mean}${sd} (${spread.count})`
}

export function surveyAverageRows(bands: readonly SpatialAverageBand[], readings: readonly SurveyBandReading[]): SurveyAverageRow[] {
  return bands.map((band) => ({
    centreHz: band.centreHz,
    bandLabel: formatFrequencyHz(band.centreHz),
    cells: Object.fromEntries(SURVEY_AVERAGE_COLUMNS.map((c) => [c.key, formatSpread(band.parameters[c.key], c.decimals, c.scale)])) as Record<AveragedParameter, string>,
    note: readings.find((r) => r.centreHz === band.centreHz)?.reliabilityNote ?? null,
  }))
}
