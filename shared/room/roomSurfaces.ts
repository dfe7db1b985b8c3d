import type { RoomBoundary } from './boundaryInterference'
import { assertRoomDimensions, type RoomDimensions } from './roomGeometry'

export interface SurfaceArea {
  /** 'floor', 'front wall' … or the opening's own name ('door'). */
  name: string
  /** The room boundary the area lies in. */
  boundary: RoomBoundary
  areaM2: number
  materialId: string
}

export interface Opening {
  name: string
  boundary: RoomBoundary
  areaM2: number
  materialId: string
}

export interface SurfaceMaterials {
  floor: string
  ceiling: string
  /** Material of all four walls unless a wall is given its own. */
  walls: string
  frontWall?: string
  rearWall?: string
  leftWall?: string
  rightWall?: string
}

/**
 * The six boundary areas of a rectangular room with their materials (floor and ceiling L·W,
 * front and rear walls W·H, side walls L·H), each less the openings (doors, windows) it holds;
 * every opening is listed as its own area with its own material. Areas sum to 2(LW + WH + HL).
 */
export function roomSurfaces(room: RoomDimensions, materials: SurfaceMaterials, openings: readonly Opening[] = []): SurfaceArea[] {
  assertRoomDimensions(room)
  const { lengthM: l, widthM: w, heightM: h } = room
  const base: SurfaceArea[] = [
    { name: 'floor', boundary: 'floor', areaM2: l * w, materialId: materials.floor },
    { name: 'ceiling', boundary: 'ceiling', areaM2: l * w, materialId: materials.ceiling },
    { name: 'front wall', boundary: 'front wall', areaM2: w * h, materialId: materials.frontWall ?? materials.walls },
    { name: 'rear wall', boundary: 'rear wall', areaM2: w * h, materialId: materials.rearWall ?? materials.walls },
    { name: 'left side wall', boundary: 'left side wall', areaM2: l * h, materialId: materials.leftWall ?? materials.walls },
    { name: 'right side wall', boundary: 'right side wall', areaM2: l * h, materialId: materials.rightWall ?? materials.walls },
  ]
  for (const opening of openings) {
    const host = base.find((surface) => surface.boundary === opening.boundary)!
    if (!(opening.areaM2 >= 0) || opening.areaM2 > host.areaM2 + 1e-9) {
      throw new RangeError(`opening '${opening.name}' (${opening.areaM2} m²) does not fit the ${opening.boundary} (${host.areaM2.toFixed(2)} m² left)`)
    }
    host.areaM2 -= opening.areaM2
  }
  return [...base, ...openings.map((o) => ({ name: o.name, boundary: o.boundary, areaM2: o.areaM2, materialId: o.materialId }))]
}
