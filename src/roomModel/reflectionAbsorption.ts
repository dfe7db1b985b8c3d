import type { MaterialDto, TreatmentDto } from '@shared/api'
import type { RoomBoundary } from '@shared/room'

/** Coefficient indices of 500 Hz, 1 kHz and 2 kHz in the eight-octave rows (63 Hz … 8 kHz). */
const REFLECTION_BAND_INDICES = [3, 4, 5] as const

/**
 * One broadband absorption coefficient per boundary for the first-reflection levels: the mean of
 * the boundary material's 500 Hz–2 kHz values (our choice: the range where early reflections
 * colour the sound and imaging, common practice). Panels are not placed at points, so a panel
 * over a reflection point is not counted; materials with no value there are left at 0 (rigid).
 */
export function reflectionAbsorption(treatment: TreatmentDto, materials: readonly MaterialDto[]): Partial<Record<RoomBoundary, number>> {
  const m = treatment.surfaceMaterials
  const byBoundary: Record<RoomBoundary, string> = {
    'front wall': m.frontWall ?? m.walls,
    'rear wall': m.rearWall ?? m.walls,
    'left side wall': m.leftWall ?? m.walls,
    'right side wall': m.rightWall ?? m.walls,
    floor: m.floor,
    ceiling: m.ceiling,
  }
  const result: Partial<Record<RoomBoundary, number>> = {}
  for (const [boundary, materialId] of Object.entries(byBoundary) as [RoomBoundary, string][]) {
    const material = materials.find((x) => x.id === materialId)
    const values = REFLECTION_BAND_INDICES.map((i) => material?.coefficients[i]).filter((v): v is number => typeof v === 'number')
    if (values.length > 0) result[boundary] = Math.min(values.reduce((s, v) => s + v, 0) / values.length, 1)
  }
  return result
}
