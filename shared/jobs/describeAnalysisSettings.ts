import type { AnalysisSettings } from '../types/analysis'

/**
 * "octave bands · 1/6-octave smoothing · channel 0 · no gate · time-reversed filtering" (channels
 * from 0, as in the API); survey settings have no channel and leave it out. For captions, activity
 * lines and the report's method notes.
 */
export function describeAnalysisSettings(settings: Omit<AnalysisSettings, 'channel'> & { channel?: number }): string {
  return [
    settings.bands === 'octave' ? 'octave bands' : 'third-octave bands',
    `1/${settings.smoothing}-octave smoothing`,
    ...(settings.channel === undefined ? [] : [`channel ${settings.channel}`]),
    settings.gateMs === null ? 'no gate' : `${settings.gateMs} ms gate`,
    settings.timeReversedFiltering ? 'time-reversed filtering' : 'forward filtering',
  ].join(' · ')
}
