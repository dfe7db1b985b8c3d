/**
 * A rectangular (shoebox) room. Coordinates used throughout shared/room: x along the length from
 * the front wall (x = 0, where the loudspeakers stand) to the rear wall (x = lengthM); y across
 * the width from the left wall (y = 0, on the left of a listener facing the front wall) to the
 * right wall; z height from the floor (z = 0) to the ceiling. All in metres.
 */
export interface RoomDimensions {
  lengthM: number
  widthM: number
  heightM: number
}

/** A point in room coordinates (see {@link RoomDimensions}), metres. */
export interface RoomPoint {
  xM: number
  yM: number
  zM: number
}

/** Volume V = L·W·H, m³. */
export function roomVolumeM3(room: RoomDimensions): number {
  return room.lengthM * room.widthM * room.heightM
}

/** Total boundary area S = 2(LW + WH + HL), m². */
export function roomSurfaceAreaM2(room: RoomDimensions): number {
  const { lengthM: l, widthM: w, heightM: h } = room
  return 2 * (l * w + w * h + h * l)
}

/** Distance between two points, m. */
export function distanceM(a: RoomPoint, b: RoomPoint): number {
  return Math.hypot(a.xM - b.xM, a.yM - b.yM, a.zM - b.zM)
}

/** Throws a RangeError unless all three dimensions are finite and positive. */
export function assertRoomDimensions(room: RoomDimensions): void {
  const entries: [string, number][] = [['lengthM', room.lengthM], ['widthM', room.widthM], ['heightM', room.heightM]]
  for (const [name, value] of entries) {
    if (!(Number.isFinite(value) && value > 0)) throw new RangeError(`${name} must be a positive number, got ${value}`)
  }
}

/** Throws a RangeError unless the point lies inside the room (boundaries included). */
export function assertPointInRoom(point: RoomPoint, room: RoomDimensions, label = 'point'): void {
  const inside =
    point.xM >= 0 && point.xM <= room.lengthM && point.yM >= 0 && point.yM <= room.widthM && point.zM >= 0 && point.zM <= room.heightM
  if (!inside) throw new RangeError(`${label} (${point.xM}, ${point.yM}, ${point.zM}) m lies outside the room`)
}
