import { bandVerdicts, type MeasuredBand } from './bandVerdict'
import type { TargetMask } from './targetMask'

/**
 * Mid-band reverberation time: mean of the reliable values in the 500 Hz and 1 kHz octaves, or
 * the third octaves inside them (400 Hz–1.25 kHz). The 500 + 1000 Hz average is the usual
 * single-number value (ISO 3382-1 — from memory — verify). Null when no reliable value exists.
 */
export function midBandReverberationS(measured: readonly MeasuredBand[]): number | null {
  const values = measured
    .filter((m) => m.centreHz >= 355 && m.centreHz <= 1413 && m.isReliable && m.reverberationTimeS !== null)
    .map((m) => m.reverberationTimeS as number)
  return values.length === 0 ? null : values.reduce((sum, v) => sum + v, 0) / values.length
}

function insideCount(measured: readonly MeasuredBand[], mask: TargetMask): { inside: number; judged: number } {
  const verdicts = bandVerdicts(measured, mask).filter((v) => v.verdict !== 'no-target')
  return { inside: verdicts.filter((v) => v.verdict === 'inside').length, judged: verdicts.length }
}

/**
 * One line on what a change achieved, e.g. "After panels: 6 of 7 octave bands inside the target
 * (was 2); mid-band T fell from 0.62 s to 0.31 s." Counts only bands where the mask sets a limit.
 */
export function summarizeVerdictChange(input: {
  afterLabel: string
  before: readonly MeasuredBand[]
  after: readonly MeasuredBand[]
  mask: TargetMask
  bandKind: 'octave' | 'third-octave'
}): string {
  const before = insideCount(input.before, input.mask)
  const after = insideCount(input.after, input.mask)
  const bandsText = `${after.inside} of ${after.judged} ${input.bandKind} band${after.judged === 1 ? '' : 's'} inside the target (was ${before.inside})`
  const beforeMidS = midBandReverberationS(input.before)
  const afterMidS = midBandReverberationS(input.after)
  let midText = 'mid-band T not available'
  if (beforeMidS !== null && afterMidS !== null) {
    const from = beforeMidS.toFixed(2)
    const to = afterMidS.toFixed(2)
    midText = from === to ? `mid-band T stayed at ${to} s` : `mid-band T ${afterMidS < beforeMidS ? 'fell' : 'rose'} from ${from} s to ${to} s`
  }
  return `${input.afterLabel}: ${bandsText}; ${midText}.`
}
