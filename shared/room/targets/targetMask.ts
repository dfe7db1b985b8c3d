/** One band of a target: limits on the reverberation time, s; null = no limit in this band. */
export interface TargetBand {
  centreHz: number
  minS: number | null
  maxS: number | null
  nominalS: number | null
}

/** Where a published target comes from, as a client reads it: standard, edition and clause. */
export interface TargetCitation {
  standard: string
  edition: string
  clause: string
}

/**
 * published: a standard's mask; common-practice: a rule of the trade without a standard behind it;
 * custom: limits a workspace defined itself, with its own source note.
 */
export type TargetKind = 'published' | 'common-practice' | 'custom'

export interface TargetMask {
  id: string
  name: string
  kind: TargetKind
  /** Set for published targets; null for common practice and custom targets. */
  citation: TargetCitation | null
  /** Where a custom target's limits come from (required for custom targets); null otherwise. */
  sourceNote: string | null
  /** Plain notes shown beside the mask (how it is evaluated); never internal provenance. */
  notes: string[]
  bands: TargetBand[]
}

/**
 * Piecewise-linear interpolation in lg f through (frequencyHz, value) points sorted by frequency,
 * held constant outside the first and last point (how the standards' tolerance figures are read).
 */
export function interpolateInLogFrequency(points: readonly (readonly [number, number])[], frequencyHz: number): number {
  const first = points[0]
  const last = points[points.length - 1]
  if (!first || !last) throw new RangeError('at least one point is needed')
  if (frequencyHz <= first[0]) return first[1]
  if (frequencyHz >= last[0]) return last[1]
  for (let i = 1; i < points.length; i++) {
    const [f1, v1] = points[i - 1]!
    const [f2, v2] = points[i]!
    if (frequencyHz <= f2) return v1 + ((v2 - v1) * Math.log10(frequencyHz / f1)) / Math.log10(f2 / f1)
  }
  return last[1]
}

/** True when a nominal band centre lies inside [lowHz, highHz] (1 % slack for nominal labels). */
export function isBandWithin(centreHz: number, lowHz: number, highHz: number): boolean {
  return centreHz >= lowHz * 0.99 && centreHz <= highHz * 1.01
}
