import type { RoomMode } from './roomModes'

export interface ModeGap {
  lowerHz: number
  upperHz: number
  gapHz: number
}

/**
 * Gaps between successive distinct mode frequencies (sorted modes in, gaps out; modes closer than
 * 1e−9 Hz count as one frequency). Large gaps at low frequency are where a small room sounds
 * uneven (common practice).
 */
export function modeSpacing(modes: readonly RoomMode[]): ModeGap[] {
  const frequencies = [...new Set(modes.map((mode) => mode.frequencyHz))].sort((a, b) => a - b)
  const gaps: ModeGap[] = []
  for (let i = 1; i < frequencies.length; i++) {
    const lowerHz = frequencies[i - 1]!
    const upperHz = frequencies[i]!
    if (upperHz - lowerHz > 1e-9) gaps.push({ lowerHz, upperHz, gapHz: upperHz - lowerHz })
  }
  return gaps
}
