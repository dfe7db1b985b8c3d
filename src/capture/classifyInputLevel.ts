export type InputLevelVerdict = 'clipping' | 'too-quiet' | 'good'

/** At or above this peak the converter is at (or within 0.5 dB of) full scale: treat as clipped (common practice). */
export const CLIPPING_PEAK_DBFS = -0.5
/** Below this peak the decay cannot rise 45 dB above a typical converter's noise (common practice, from memory). */
export const TOO_QUIET_PEAK_DBFS = -40

/** Judges a peak level for a sweep capture: clipping, too quiet, or good. */
export function classifyInputLevel(peakDb: number): InputLevelVerdict {
  if (peakDb >= CLIPPING_PEAK_DBFS) return 'clipping'
  if (!(peakDb >= TOO_QUIET_PEAK_DBFS)) return 'too-quiet'
  return 'good'
}

/** What to tell the person about a level, and what to do about it. */
export const INPUT_LEVEL_ADVICE: Record<InputLevelVerdict, string> = {
  clipping: 'The input is clipping (peak at full scale). Turn the microphone gain or the speaker volume down.',
  'too-quiet': 'The input is very quiet (peak below −40 dBFS). Raise the microphone gain, or move the microphone closer, before turning the speaker up.',
  good: 'The input level is fine.',
}
