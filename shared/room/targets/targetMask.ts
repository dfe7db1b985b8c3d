/** One band of a target: limits on the reverberation time, s; null = no limit in this band. */
export interface TargetBand {
  centreHz: number
  minS: number | null
  maxS: number | null
  nominalS: number | null
}

export interface TargetMask {
  id: string
  name: string
  /** The publication the mask comes from, with any "from memory — verify" caveat. */
  source: string
  /** Caveats carried from the facts file, shown beside the mask. */
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
