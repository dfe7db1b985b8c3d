import type { MeasuredBand } from '@shared/room'
import type { ComparisonDto, SurveySummaryDto } from '@shared/api'
import type { SeriesRole } from '@/components/charts/chartPalette'
import type { ResponseSeries } from '@/components/charts/frequencyResponseOption'
import type { ReverberationSeries } from '@/components/charts/reverberationTargetOption'

/** First survey = before, last = after, any between = other (the order the comparison was asked for). */
export function comparisonRole(index: number, count: number): SeriesRole {
  return index === 0 ? 'before' : index === count - 1 ? 'after' : 'other'
}

/** A survey's judged reverberation time per band, as the verdict strip and target chart read it. */
export function measuredBands(summary: SurveySummaryDto): MeasuredBand[] {
  return summary.readings.map((r) => ({ centreHz: r.centreHz, reverberationTimeS: r.reverberationTimeS, isReliable: r.isReliable, isAnalysed: r.isAnalysed }))
}

/** The averaged responses of the compared surveys that have one, as sent (1/6-octave smoothing). */
export function comparisonResponseSeries(comparison: ComparisonDto): ResponseSeries[] {
  const count = comparison.surveys.length
  return comparison.surveys.flatMap(({ summary }, i) =>
    summary.averagedResponse
      ? [{ name: `${summary.survey.name} · average of ${summary.analysedCount}`, role: comparisonRole(i, count), frequencyHz: summary.averagedResponse.frequencyHz, magnitudeDb: summary.averagedResponse.magnitudeDb }]
      : [],
  )
}

export function comparisonReverberationSeries(comparison: ComparisonDto): ReverberationSeries[] {
  const count = comparison.surveys.length
  return comparison.surveys.map(({ summary }, i) => ({ name: summary.survey.name, role: comparisonRole(i, count), bands: measuredBands(summary) }))
}
