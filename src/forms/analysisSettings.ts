import type { AnalysisSettings, SmoothingFraction } from '@shared/types/analysis'

export const SMOOTHING_FRACTIONS: readonly SmoothingFraction[] = [1, 3, 6, 12, 24, 48]

/** True when two analyses used the same settings (so a new one would repeat the old). */
export function isSameAnalysisSettings(a: AnalysisSettings, b: AnalysisSettings): boolean {
  return (
    a.bands === b.bands &&
    a.smoothing === b.smoothing &&
    a.channel === b.channel &&
    (a.gateMs ?? null) === (b.gateMs ?? null) &&
    a.timeReversedFiltering === b.timeReversedFiltering
  )
}

export { describeAnalysisSettings } from '@shared/jobs/describeAnalysisSettings'
