import { isBandWithin, type TargetMask } from './targetMask'

const CUBIC_FOOT_M3 = 0.028316846592
const SMALL_ROOM_LIMIT_M3 = 10_000 * CUBIC_FOOT_M3
const LARGE_ROOM_LIMIT_M3 = 20_000 * CUBIC_FOOT_M3

/**
 * Maximum reverberation time of an unoccupied, furnished core learning space, ANSI/ASA S12.60
 * (2010 Part 1): 0.6 s below 10 000 ft³ (283 m³), 0.7 s for 10 000–20 000 ft³ (283–566 m³),
 * null above (no limit given) [stored summaries of ANSI S12.60-2002/-2010; facts §9].
 */
export function ansiS1260MaxS(volumeM3: number): number | null {
  if (volumeM3 < SMALL_ROOM_LIMIT_M3) return 0.6
  if (volumeM3 <= LARGE_ROOM_LIMIT_M3) return 0.7
  return null
}

/**
 * ANSI S12.60 mask: an upper limit only, in the 500, 1000 and 2000 Hz octaves (and the third
 * octaves inside them) where the limit is evaluated (bands from memory — verify).
 */
export function ansiS1260Mask(volumeM3: number, bandsHz: readonly number[]): TargetMask {
  const maxS = ansiS1260MaxS(volumeM3)
  // The evaluation bands are from memory — verify (facts §9).
  const notes = ['Evaluated in the 500, 1000 and 2000 Hz octave bands.']
  if (maxS === null) notes.push('Above 566 m³ (20 000 ft³) the standard gives no limit for core learning spaces.')
  return {
    id: 'ansi-s12-60',
    name: 'Core learning space (ANSI/ASA S12.60)',
    kind: 'published',
    citation: { standard: 'ANSI/ASA S12.60', edition: '2010, Part 1', clause: 'maximum reverberation time of unoccupied, furnished core learning spaces' },
    sourceNote: null,
    notes,
    bands: bandsHz.map((centreHz) => {
      const isEvaluated = maxS !== null && isBandWithin(centreHz, 400, 2500)
      return { centreHz, minS: null, maxS: isEvaluated ? maxS : null, nominalS: null }
    }),
  }
}
