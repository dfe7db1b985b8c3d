import type { EtcPeak } from './etcPeakPicker'
import type { PredictedReflection } from './firstReflections'

export interface ReflectionMatch {
  /** The measured peak (time after the direct sound, ms; level re direct, dB). */
  peak: EtcPeak
  /** The best-fitting predicted reflection, or null when none lies within the tolerance. */
  reflection: PredictedReflection | null
  /** Measured minus predicted delay, ms (null without a match). */
  delayErrorMs: number | null
  /** One plain-language line for the capture page. */
  sentence: string
}

const formatMs = (value: number) => value.toFixed(1)
const formatDb = (value: number) => `${value < 0 ? '−' : '+'}${Math.abs(value).toFixed(0)}`

/**
 * For each measured ETC peak, the predicted first-order reflection whose delay is closest,
 * provided it lies within toleranceMs (default 0.3 ms ≈ 10 cm of path). Closest in delay wins;
 * among equal delays the louder prediction wins. Matching by delay alone is a heuristic:
 * symmetric layouts give two surfaces with one delay, and desks or furniture give peaks that no
 * surface of the shoebox explains.
 */
export function matchReflectionsToEtcPeaks(
  peaks: readonly EtcPeak[],
  reflections: readonly PredictedReflection[],
  options: { toleranceMs?: number } = {},
): ReflectionMatch[] {
  const { toleranceMs = 0.3 } = options
  return peaks.map((peak) => {
    let best: PredictedReflection | null = null
    for (const reflection of reflections) {
      const error = Math.abs(reflection.delayMs - peak.timeMs)
      if (error > toleranceMs) continue
      const bestError = best ? Math.abs(best.delayMs - peak.timeMs) : Infinity
      if (error < bestError - 1e-9 || (Math.abs(error - bestError) <= 1e-9 && best && reflection.levelDb > best.levelDb)) best = reflection
    }
    const heard = `A reflection ${formatMs(peak.timeMs)} ms after the direct sound, ${formatDb(peak.levelDb)} dB`
    const sentence = best
      ? `${heard}, fits the ${best.surface} (${best.speaker} speaker).`
      : `${heard}, fits no first-order reflection of the room's surfaces: look for a desk, furniture or a later path.`
    return { peak, reflection: best, delayErrorMs: best ? peak.timeMs - best.delayMs : null, sentence }
  })
}
