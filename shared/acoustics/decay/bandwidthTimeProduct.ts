/**
 * Shortest reverberation time a band filter of bandwidth B can measure without its own ringing
 * dominating: B·T > 16 for forward filtering, B·T > 4 for time-reversed filtering.
 * @see ISO 3382-2:2008 7.3 Eqs. (4)/(5) and NOTE (via transcription)
 * @returns T_min, s
 */
export function minimumReverberationTimeS(bandwidthHz: number, isTimeReversed: boolean): number {
  return (isTimeReversed ? 4 : 16) / bandwidthHz
}
