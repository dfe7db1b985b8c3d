import { bandVerdicts, type BandVerdict, type MeasuredBand } from './bandVerdict'
import type { TargetMask } from './targetMask'

/**
 * Mid-band reverberation time: mean of the reliable values in the 500 Hz and 1 kHz octaves, or
 * the third octaves inside them (400 Hz–1.25 kHz). The 500 + 1000 Hz average is the usual
 * single-number value (ISO 3382-1 — from memory — verify). Null when no reliable value exists.
 */
export function midBandReverberationS(measured: readonly MeasuredBand[]): number | null {
  const values = measured
    .filter((m) => m.centreHz >= 355 && m.centreHz <= 1413 && m.isReliable && m.isAnalysed !== false && m.reverberationTimeS !== null)
    .map((m) => m.reverberationTimeS as number)
  return values.length === 0 ? null : values.reduce((sum, v) => sum + v, 0) / values.length
}

export interface VerdictCounts {
  inside: number
  tooLive: number
  tooDead: number
  notReliable: number
  notAnalysed: number
  /** Bands judged against a limit: inside + too live + too dead. */
  judged: number
}

/** How many of the mask's limited bands fall in each verdict (bands without a limit are left out). */
export function countVerdicts(measured: readonly MeasuredBand[], mask: TargetMask): VerdictCounts {
  const verdicts = bandVerdicts(measured, mask).map((v) => v.verdict)
  const count = (verdict: BandVerdict) => verdicts.filter((v) => v === verdict).length
  const counts = { inside: count('inside'), tooLive: count('too-live'), tooDead: count('too-dead'), notReliable: count('not-reliable'), notAnalysed: count('not-analysed') }
  return { ...counts, judged: counts.inside + counts.tooLive + counts.tooDead }
}

const plural = (count: number, word: string) => `${count} ${word}${count === 1 ? '' : 's'}`

/**
 * One line on what a change achieved, e.g. "After panels: 6 of 7 judged octave bands inside the
 * target (was 2 of 7); mid-band T fell from 0.62 s to 0.31 s." Counts only bands that were judged;
 * bands not analysed or not reliable are named apart, never counted as outside.
 */
export function summarizeVerdictChange(input: {
  afterLabel: string
  before: readonly MeasuredBand[]
  after: readonly MeasuredBand[]
  mask: TargetMask
  bandKind: 'octave' | 'third-octave'
}): string {
  const before = countVerdicts(input.before, input.mask)
  const after = countVerdicts(input.after, input.mask)
  if (after.judged === 0 && after.notAnalysed > 0 && after.notReliable === 0) {
    return `${input.afterLabel}: not analysed in ${input.bandKind} bands yet, so no band was judged.`
  }
  const was = before.judged === 0 ? 'before: none judged' : `was ${before.inside} of ${before.judged}`
  const parts = [after.judged === 0 ? `no ${input.bandKind} band could be judged` : `${after.inside} of ${plural(after.judged, `judged ${input.bandKind} band`)} inside the target (${was})`]
  if (after.notReliable > 0) parts.push(`${plural(after.notReliable, 'band')} not reliable`)
  if (after.notAnalysed > 0) parts.push(`${plural(after.notAnalysed, 'band')} not analysed yet`)
  const beforeMidS = midBandReverberationS(input.before)
  const afterMidS = midBandReverberationS(input.after)
  let midText = 'mid-band T not available'
  if (beforeMidS !== null && afterMidS !== null) {
    const from = beforeMidS.toFixed(2)
    const to = afterMidS.toFixed(2)
    midText = from === to ? `mid-band T stayed at ${to} s` : `mid-band T ${afterMidS < beforeMidS ? 'fell' : 'rose'} from ${from} s to ${to} s`
  }
  return `${input.afterLabel}: ${[...parts, midText].join('; ')}.`
}
