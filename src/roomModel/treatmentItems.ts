import type { TreatmentDto } from '@shared/api'
import { parseNumberInput } from '@/utils/formatNumber'

export type TreatmentOpening = TreatmentDto['openings'][number]
export type TreatmentAbsorber = TreatmentDto['absorbers'][number]

/** A new window: 1.5 m² of ordinary glass in the rear wall (a starting row the user edits). */
export function newOpening(): TreatmentOpening {
  return { name: 'Window', boundary: 'rear wall', areaM2: 1.5, materialId: 'glass-window' }
}

/** A new absorber row: four 1.2 × 0.6 m panels of 50 mm mineral wool on the left wall (a starting row). */
export function newAbsorber(): TreatmentAbsorber {
  return { name: 'Panel', materialId: 'mineral-wool-24kg-50mm', areaM2: 0.72, count: 4, mountedOn: 'left wall' }
}

/** A copy of the list with one item changed. */
export function replaceAt<T>(list: readonly T[], index: number, change: Partial<T>): T[] {
  return list.map((item, i) => (i === index ? { ...item, ...change } : item))
}

export function removeAt<T>(list: readonly T[], index: number): T[] {
  return list.filter((_, i) => i !== index)
}

/** A typed area or count when it is a positive number (whole for counts), else null (keep the old value). */
export function parsePositive(text: string, isWhole = false): number | null {
  const value = parseNumberInput(text)
  if (value === null || Number.isNaN(value) || value <= 0) return null
  if (isWhole && !Number.isInteger(value)) return null
  return value
}
