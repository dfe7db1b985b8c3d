import type { AnalysisSettings } from '../types/analysis'
import { DEFAULT_ANALYSIS_SETTINGS } from '../acoustics/analyseCapture'

export { DEFAULT_ANALYSIS_SETTINGS }

/** Canonical key of a settings object (fixed key order), so one settings set maps to one row. */
export function settingsToKey(settings: AnalysisSettings): string {
  const { bands, smoothing, channel, gateMs, timeReversedFiltering } = settings
  return JSON.stringify({ bands, smoothing, channel, gateMs, timeReversedFiltering })
}

export function keyToSettings(key: string | undefined): AnalysisSettings {
  if (!key) return DEFAULT_ANALYSIS_SETTINGS
  return { ...DEFAULT_ANALYSIS_SETTINGS, ...(JSON.parse(key) as Partial<AnalysisSettings>) }
}
