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

/** "octave bands · 1/6-octave smoothing · channel 0 · no gate · time-reversed filtering" (channels from 0, as in the API): settings for captions. */
export function describeAnalysisSettings(settings: AnalysisSettings): string {
  return [
    settings.bands === 'octave' ? 'octave bands' : 'third-octave bands',
    `1/${settings.smoothing}-octave smoothing`,
    `channel ${settings.channel}`,
    settings.gateMs === null ? 'no gate' : `${settings.gateMs} ms gate`,
    settings.timeReversedFiltering ? 'time-reversed filtering' : 'forward filtering',
  ].join(' · ')
}
