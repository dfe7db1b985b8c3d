import type { TargetMask } from './targetMask'

/** A workspace's own target: limits per octave band and the note saying where they come from. */
export interface CustomTargetDefinition {
  id: number
  name: string
  sourceNote: string
  /** One entry per octave centre 63 Hz–8 kHz; null = no limit on that side. */
  octaveLimits: { centreHz: number; minS: number | null; maxS: number | null }[]
}

/** The octave (of the definition) a band centre lies in, within half an octave; null outside. */
function enclosingOctave(definition: CustomTargetDefinition, centreHz: number) {
  let best: CustomTargetDefinition['octaveLimits'][number] | null = null
  for (const octave of definition.octaveLimits) {
    const distance = Math.abs(Math.log2(centreHz / octave.centreHz))
    if (distance <= 0.5 + 1e-6 && (best === null || distance < Math.abs(Math.log2(centreHz / best.centreHz)))) best = octave
  }
  return best
}

/**
 * The mask of a custom target at the given band centres. A third-octave band takes the limits of
 * the octave it lies in (each octave's limits applied to its three thirds — common practice).
 */
export function customTargetMask(definition: CustomTargetDefinition, bandsHz: readonly number[]): TargetMask {
  return {
    id: `custom:${definition.id}`,
    name: definition.name,
    kind: 'custom',
    citation: null,
    sourceNote: definition.sourceNote,
    notes: bandsHz.some((hz) => !definition.octaveLimits.some((o) => o.centreHz === hz)) ? ['Third-octave bands take the limits of the octave they lie in.'] : [],
    bands: bandsHz.map((centreHz) => {
      const octave = enclosingOctave(definition, centreHz)
      const minS = octave?.minS ?? null
      const maxS = octave?.maxS ?? null
      return { centreHz, minS, maxS, nominalS: minS !== null && maxS !== null ? (minS + maxS) / 2 : null }
    }),
  }
}
