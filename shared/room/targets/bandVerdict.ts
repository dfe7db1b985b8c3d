import type { TargetBand, TargetMask } from './targetMask'

/** 'no-target' marks a band in which the mask sets no limit. */
export type BandVerdict = 'inside' | 'too-live' | 'too-dead' | 'not-reliable' | 'no-target'

export interface MeasuredBand {
  centreHz: number
  /** Measured (e.g. spatially averaged T30) reverberation time, s; null if not computed. */
  reverberationTimeS: number | null
  /** False when the analysis flagged the value (decay range, B·T, curvature …). */
  isReliable: boolean
}

/**
 * Verdict for one band: not-reliable when the value is missing or flagged (flagged values are
 * never judged), too-live above maxS, too-dead below minS, else inside. No limit → no-target.
 */
export function bandVerdict(measured: Pick<MeasuredBand, 'reverberationTimeS' | 'isReliable'>, target: TargetBand): BandVerdict {
  if (target.minS === null && target.maxS === null) return 'no-target'
  const value = measured.reverberationTimeS
  if (value === null || !Number.isFinite(value) || !measured.isReliable) return 'not-reliable'
  if (target.maxS !== null && value > target.maxS) return 'too-live'
  if (target.minS !== null && value < target.minS) return 'too-dead'
  return 'inside'
}

/** Verdicts for every band of the mask; a band with no measurement is not-reliable. */
export function bandVerdicts(measured: readonly MeasuredBand[], mask: TargetMask): { centreHz: number; verdict: BandVerdict }[] {
  return mask.bands.map((target) => {
    const match = measured.find((m) => Math.abs(m.centreHz / target.centreHz - 1) < 0.01)
    return { centreHz: target.centreHz, verdict: bandVerdict(match ?? { reverberationTimeS: null, isReliable: false }, target) }
  })
}
