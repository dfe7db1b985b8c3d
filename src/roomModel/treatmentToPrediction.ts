import type { MaterialDto, TreatmentDto } from '@shared/api'
import { roomSurfaces, roomVolumeM3, type AbsorptionMaterial, type AirConditions, type PredictionInput, type RoomBoundary, type RoomDimensions } from '@shared/room'

export type TreatmentBoundary = TreatmentDto['openings'][number]['boundary']

/** The API names side walls 'left wall' / 'right wall'; the room maths 'left side wall' / 'right side wall'. */
const BOUNDARY_NAMES: Record<TreatmentBoundary, RoomBoundary> = {
  'front wall': 'front wall',
  'rear wall': 'rear wall',
  'left wall': 'left side wall',
  'right wall': 'right side wall',
  floor: 'floor',
  ceiling: 'ceiling',
}

export function treatmentBoundaryToRoomBoundary(boundary: TreatmentBoundary): RoomBoundary {
  return BOUNDARY_NAMES[boundary]
}

/** Workspace materials as the room maths reads them (the DTO carries the same fields). */
export function materialsToLibrary(materials: readonly MaterialDto[]): AbsorptionMaterial[] {
  return materials.map(({ id, name, kind, coefficients, source, caution }) => ({ id, name, kind, coefficients, source, ...(caution ? { caution } : {}) }))
}

/**
 * The saved treatment plan → the input of predictReverberation: the six boundaries less their
 * openings (roomSurfaces), each opening its own area, absorbers mounted on the boundary they
 * cover, the workspace library and the air state. Throws a RangeError (from roomSurfaces) when an
 * opening is larger than its wall.
 */
export function treatmentToPrediction(room: RoomDimensions, treatment: TreatmentDto, materials: readonly MaterialDto[], air: AirConditions): PredictionInput {
  const openings = treatment.openings.map((o) => ({ name: o.name, boundary: treatmentBoundaryToRoomBoundary(o.boundary), areaM2: o.areaM2, materialId: o.materialId }))
  const absorbers = treatment.absorbers.map((a) => ({
    name: a.name,
    materialId: a.materialId,
    areaM2: a.areaM2,
    count: a.count,
    ...(a.mountedOn ? { mountedOn: treatmentBoundaryToRoomBoundary(a.mountedOn) } : {}),
  }))
  return {
    volumeM3: roomVolumeM3(room),
    surfaces: roomSurfaces(room, treatment.surfaceMaterials, openings),
    absorbers,
    bandsHz: [125, 250, 500, 1000, 2000, 4000],
    air,
    includeAirAbsorption: true,
    materials: materialsToLibrary(materials),
  }
}

/** The boundaries an opening or absorber may sit in, as the API names them. */
export const TREATMENT_BOUNDARIES = Object.keys(BOUNDARY_NAMES) as TreatmentBoundary[]
