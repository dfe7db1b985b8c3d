import { interpolateInLogFrequency, type TargetMask } from './targetMask'

export type Din18041Group = 'A1' | 'A2' | 'A3' | 'A4' | 'A5'

interface GroupFormula {
  name: string
  slope: number
  offset: number
  minVolumeM3: number
  maxVolumeM3: number
}

/**
 * DIN 18041:2016 group A: T_soll = slope·lg V + offset, valid for minVolume ≤ V < maxVolume
 * [formulas and ranges as implemented in stored open-source tools; facts §9].
 */
export const DIN_18041_GROUPS: Record<Din18041Group, GroupFormula> = {
  A1: { name: 'music', slope: 0.45, offset: 0.07, minVolumeM3: 30, maxVolumeM3: 1000 },
  A2: { name: 'speech / lecture', slope: 0.37, offset: -0.14, minVolumeM3: 50, maxVolumeM3: 5000 },
  A3: { name: 'teaching / communication', slope: 0.32, offset: -0.17, minVolumeM3: 30, maxVolumeM3: 5000 },
  A4: { name: 'teaching / communication, inclusive', slope: 0.26, offset: -0.14, minVolumeM3: 30, maxVolumeM3: 500 },
  A5: { name: 'sport', slope: 0.75, offset: -1.0, minVolumeM3: 200, maxVolumeM3: 10_000 },
}

/**
 * Target reverberation time T_soll of a DIN 18041 group A room, s, and whether V lies in the
 * group's range (outside it the value is an extrapolation). A5 is 2.0 s above 10 000 m³.
 * V = 200 m³: A3 → 0.5663 s, A4 → 0.4583 s.
 */
export function din18041NominalS(group: Din18041Group, volumeM3: number): { nominalS: number; isVolumeInRange: boolean } {
  const formula = DIN_18041_GROUPS[group]
  const isVolumeInRange = volumeM3 >= formula.minVolumeM3 && volumeM3 < formula.maxVolumeM3
  if (group === 'A5' && volumeM3 >= formula.maxVolumeM3) return { nominalS: 2.0, isVolumeInRange: true }
  return { nominalS: formula.slope * Math.log10(volumeM3) + formula.offset, isVolumeInRange }
}

// Tolerance band as multiples of T_soll (secondary source — verify DIN 18041:2016 Fig. 2/3).
const UPPER_FACTOR: [number, number][] = [[63, 1.7], [125, 1.45], [250, 1.2], [8000, 1.2]]
const LOWER_FACTOR: [number, number][] = [[63, 0.5], [125, 0.65], [250, 0.8], [2000, 0.8], [4000, 0.65], [8000, 0.5]]

/** DIN 18041 group A mask: T_soll times the tolerance multiples, interpolated in lg f. */
export function din18041Mask(group: Din18041Group, volumeM3: number, bandsHz: readonly number[]): TargetMask {
  const { nominalS, isVolumeInRange } = din18041NominalS(group, volumeM3)
  const formula = DIN_18041_GROUPS[group]
  // The tolerance multiples come from a secondary source — verify DIN 18041:2016 Fig. 2/3 (and
  // whether A1 and A5 differ); "T_soll refers to the occupied room" is from memory — verify (facts §9).
  const notes = [`T_soll = ${nominalS.toFixed(2)} s for this volume; T_soll refers to the occupied room.`]
  if (!isVolumeInRange) notes.push(`The volume lies outside the group's range ${formula.minVolumeM3}–${formula.maxVolumeM3} m³: the target is extrapolated.`)
  return {
    id: `din-18041-${group.toLowerCase()}`,
    name: `DIN 18041 group ${group} (${formula.name})`,
    kind: 'published',
    citation: {
      standard: 'DIN 18041',
      edition: '2016',
      clause: `room group ${group}: T_soll = ${formula.slope}·lg V ${formula.offset < 0 ? '−' : '+'} ${Math.abs(formula.offset)} s and the tolerance range of Fig. 2/3`,
    },
    sourceNote: null,
    notes,
    bands: bandsHz.map((centreHz) => ({
      centreHz,
      minS: nominalS * interpolateInLogFrequency(LOWER_FACTOR, centreHz),
      maxS: nominalS * interpolateInLogFrequency(UPPER_FACTOR, centreHz),
      nominalS,
    })),
  }
}
