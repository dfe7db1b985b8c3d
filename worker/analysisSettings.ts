import type { AnalysisSettings } from '../shared/types/analysis'

export const DEFAULT_ANALYSIS_SETTINGS: AnalysisSettings = {
  bands: 'octave',
  smoothing: 6,
  channel: 0,
  gateMs: null,
  timeReversedFiltering: true,
}

/** Canonical key of a settings object (fixed key order), so one settings set maps to one row. */
export function settingsToKey(settings: AnalysisSettings): string {
  const { bands, smoothing, channel, gateMs, timeReversedFiltering } = settings
  return JSON.stringify({ bands, smoothing, channel, gateMs, timeReversedFiltering })
}

export function keyToSettings(key: string | undefined): AnalysisSettings {
  if (!key) return DEFAULT_ANALYSIS_SETTINGS
  return { ...DEFAULT_ANALYSIS_SETTINGS, ...(JSON.parse(key) as Partial<AnalysisSettings>) }
}
