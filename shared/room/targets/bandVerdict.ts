import type { TargetBand, TargetMask } from './targetMask'

/**
 * 'no-target' marks a band in which the mask sets no limit; 'not-analysed' a band no included
 * position has an analysis for (at this band resolution); 'not-reliable' a band whose value is
 * missing or flagged although it was analysed.
 */
export type BandVerdict = 'inside' | 'too-live' | 'too-dead' | 'not-reliable' | 'not-analysed' | 'no-target'

/** The verdicts that judge a value against the limits (the others say why no judgement was made). */
export const JUDGED_VERDICTS: readonly BandVerdict[] = ['inside', 'too-live', 'too-dead']

export interface MeasuredBand {
  centreHz: number
  /** Measured (e.g. spatially averaged T30) reverberation time, s; null if not computed. */
  reverberationTimeS: number | null
  /** False when the analysis flagged the value (decay range, B·T, curvature …). */
  isReliable: boolean
  /** False when no position was analysed in this band; absent means analysed. */
  isAnalysed?: boolean
}

/**
 * Verdict for one band: not-analysed without any analysis, not-reliable when the value is missing
 * or flagged (flagged values are never judged), too-live above maxS, too-dead below minS, else
 * inside. No limit → no-target.
 */
export function bandVerdict(measured: Pick<MeasuredBand, 'reverberationTimeS' | 'isReliable' | 'isAnalysed'>, target: TargetBand): BandVerdict {
  if (target.minS === null && target.maxS === null) return 'no-target'
  if (measured.isAnalysed === false) return 'not-analysed'
  const value = measured.reverberationTimeS
  if (value === null || !Number.isFinite(value) || !measured.isReliable) return 'not-reliable'
  if (target.maxS !== null && value > target.maxS) return 'too-live'
  if (target.minS !== null && value < target.minS) return 'too-dead'
  return 'inside'
}

/** Verdicts for every band of the mask; a band without any measurement is not-analysed. */
export function bandVerdicts(measured: readonly MeasuredBand[], mask: TargetMask): { centreHz: number; verdict: BandVerdict }[] {
  return mask.bands.map((target) => {
    const match = measured.find((m) => Math.abs(m.centreHz / target.centreHz - 1) < 0.01)
    return { centreHz: target.centreHz, verdict: bandVerdict(match ?? { reverberationTimeS: null, isReliable: false, isAnalysed: false }, target) }
  })
}
