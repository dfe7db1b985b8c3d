export interface EtcPeak {
  /** Time after the direct sound, ms. */
  timeMs: number
  /** Level re the direct sound, dB. */
  levelDb: number
}

export interface EtcPeakOptions {
  /** Keep peaks no more than this far below the direct sound, dB (default 25). */
  thresholdDb?: number
  /** Ignore peaks closer than this to the direct sound or to a higher kept peak, ms (default 0.5). */
  minSeparationMs?: number
  /** Ignore peaks later than this after the direct sound, ms (default 50: the early part). */
  maxDelayMs?: number
}

export interface EtcPeaks {
  /** Time of the direct sound (the ETC maximum) on the input axis, ms. */
  directTimeMs: number
  peaks: EtcPeak[]
}

/**
 * Peaks of an energy-time curve after the direct sound: local maxima (strictly higher than the
 * left neighbour, at least as high as the right one) within thresholdDb of the ETC maximum, which
 * is taken as the direct sound. Where two peaks fall within minSeparationMs the higher one is kept.
 * Times and levels come back relative to the direct sound, ready for matchReflectionsToEtcPeaks.
 *
 * @param timeMs - ETC time axis, ms (increasing)
 * @param levelDb - ETC level, dB (any reference), same length
 */
export function pickEtcPeaks(timeMs: readonly number[], levelDb: readonly number[], options: EtcPeakOptions = {}): EtcPeaks {
  const { thresholdDb = 25, minSeparationMs = 0.5, maxDelayMs = 50 } = options
  if (timeMs.length !== levelDb.length || timeMs.length === 0) throw new RangeError('timeMs and levelDb must be non-empty and of equal length')
  let directIndex = 0
  levelDb.forEach((level, i) => {
    if (level > levelDb[directIndex]!) directIndex = i
  })
  const directTimeMs = timeMs[directIndex]!
  const directDb = levelDb[directIndex]!
  const candidates: EtcPeak[] = []
  for (let i = directIndex + 1; i < levelDb.length; i++) {
    const level = levelDb[i]!
    const delayMs = timeMs[i]! - directTimeMs
    if (delayMs > maxDelayMs) break
    const isLocalMax = level > levelDb[i - 1]! && (i === levelDb.length - 1 || level >= levelDb[i + 1]!)
    if (isLocalMax && delayMs >= minSeparationMs && level >= directDb - thresholdDb) {
      candidates.push({ timeMs: delayMs, levelDb: level - directDb })
    }
  }
  const kept: EtcPeak[] = []
  for (const peak of [...candidates].sort((a, b) => b.levelDb - a.levelDb)) {
    if (kept.every((k) => Math.abs(k.timeMs - peak.timeMs) >= minSeparationMs)) kept.push(peak)
  }
  return { directTimeMs, peaks: kept.sort((a, b) => a.timeMs - b.timeMs) }
}
