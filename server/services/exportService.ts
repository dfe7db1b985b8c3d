import type { AnalysisResult } from '../../shared/types/analysis'
import type { ComparisonDto, SurveySummaryDto } from '../../shared/api/results'
import { AVERAGED_PARAMETERS } from '../../shared/acoustics/spatialAverage'
import { toCsv } from './toCsv'

/** Band table of one analysis: seconds, dB, D50 as 0..1, Ts in seconds, warnings as codes. */
export function analysisToCsv(result: AnalysisResult): string {
  const header = ['band_hz', 'T20_s', 'T30_s', 'EDT_s', 'C50_dB', 'C80_dB', 'D50', 'Ts_s', 'decay_range_dB', 'sigma_T20_s', 'sigma_T30_s', 'warnings']
  const rows = result.bands.map((b) => [b.centreHz, b.T20, b.T30, b.EDT, b.C50, b.C80, b.D50, b.Ts, b.decayRangeDb, b.uncertaintyT20, b.uncertaintyT30, b.warnings.map((w) => w.code).join(' ')])
  const bb = result.broadband
  rows.push(['broadband', bb.T20, bb.T30, bb.EDT, bb.C50, bb.C80, bb.D50, bb.Ts, bb.decayRangeDb, bb.uncertaintyT20, bb.uncertaintyT30, bb.warnings.map((w) => w.code).join(' ')])
  return toCsv([header, ...rows])
}

/**
 * Spatial average of a survey over the included captures only: mean, standard deviation and count
 * of each parameter per band, the judged T with its ISO 3382-2 σ, and the capture ids used.
 */
export function surveySummaryToCsv(summary: SurveySummaryDto): string {
  const header = ['band_hz', ...AVERAGED_PARAMETERS.flatMap((p) => [`${p}_mean`, `${p}_sd`, `${p}_n`]), 'judged_T_s', 'judged_sigma_s', 'judged_parameter', 'reliable', 'captures_used']
  const used = summary.positions.filter((p) => p.isIncluded && p.analysisId !== null).map((p) => p.captureId).join(' ')
  const rows = summary.bands.map((band, i) => {
    const reading = summary.readings[i]!
    return [
      band.centreHz,
      ...AVERAGED_PARAMETERS.flatMap((p) => [band.parameters[p].mean, band.parameters[p].standardDeviation, band.parameters[p].count]),
      reading.reverberationTimeS,
      reading.uncertaintyS,
      reading.parameter,
      reading.isReliable ? 'yes' : 'no',
      used,
    ]
  })
  return toCsv([header, ...rows])
}

/** Comparison (included captures only): the judged T and σ per survey, the change first → last, the target limits and verdicts. */
export function comparisonToCsv(comparison: ComparisonDto): string {
  const names = comparison.surveys.map((s) => s.summary.survey.name)
  const header = ['band_hz', ...names.flatMap((n) => [`${n} T_s`, `${n} sigma_s`]), 'change_s', 'change_percent', 'target_min_s', 'target_max_s', ...names.map((n) => `${n} verdict`)]
  const rows = comparison.differences.map((difference) => {
    const target = comparison.target?.bands.find((b) => b.centreHz === difference.centreHz)
    return [
      difference.centreHz,
      ...comparison.surveys.flatMap((s) => {
        const reading = s.summary.readings.find((r) => r.centreHz === difference.centreHz)
        return [reading?.reverberationTimeS ?? null, reading?.uncertaintyS ?? null]
      }),
      difference.changeS,
      difference.changePercent,
      target?.minS ?? null,
      target?.maxS ?? null,
      ...comparison.surveys.map((s) => s.verdicts.find((v) => v.centreHz === difference.centreHz)?.verdict ?? ''),
    ]
  })
  return toCsv([header, ...rows])
}
