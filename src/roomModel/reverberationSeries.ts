import type { PredictedBand } from '@shared/room'
import type { SeriesRole } from '@/components/charts/chartPalette'
import type { ReverberationSeries } from '@/components/charts/reverberationTargetOption'
import { measuredInDateOrder, type MeasuredSurvey } from './measuredSurvey'

/** Role by date order: one survey alone is 'single'; of several the oldest is 'before', the newest 'after'. */
export function surveyRole(index: number, count: number): SeriesRole {
  if (count === 1) return 'single'
  if (index === 0) return 'before'
  return index === count - 1 ? 'after' : 'other'
}

/** Measured surveys as chart series, oldest first, each named by survey and date. */
export function measuredSurveySeries(surveys: readonly MeasuredSurvey[]): ReverberationSeries[] {
  const ordered = measuredInDateOrder(surveys)
  return ordered.map((s, i) => ({
    name: `${s.name} (${s.measuredOn})`,
    role: surveyRole(i, ordered.length),
    bands: s.readings.map((r) => ({ centreHz: r.centreHz, reverberationTimeS: r.reverberationTimeS })),
  }))
}

export const SABINE_SERIES_NAME = 'Predicted, Sabine'
export const EYRING_SERIES_NAME = 'Predicted, Eyring'

/** The plan's prediction as two chart series (null in bands where a material has no value). */
export function predictedReverberationSeries(bands: readonly PredictedBand[]): ReverberationSeries[] {
  return [
    { name: SABINE_SERIES_NAME, role: 'predicted', bands: bands.map((b) => ({ centreHz: b.centreHz, reverberationTimeS: b.sabineS })) },
    { name: EYRING_SERIES_NAME, role: 'other', bands: bands.map((b) => ({ centreHz: b.centreHz, reverberationTimeS: b.eyringS })) },
  ]
}
