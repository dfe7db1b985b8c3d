import type { RoomDimensions, RoomPoint } from '@shared/room'

/** Rounds to whole millimetres, so nudges and drags do not pile up floating-point tails. */
export function roundToMillimetre(valueM: number): number {
  return Math.round(valueM * 1000) / 1000
}

/** The point moved inside the room's box (walls included), rounded to millimetres. */
export function clampToRoom<T extends RoomPoint>(point: T, room: RoomDimensions): T {
  const clamp = (value: number, max: number) => roundToMillimetre(Math.min(Math.max(value, 0), max))
  return { ...point, xM: clamp(point.xM, room.lengthM), yM: clamp(point.yM, room.widthM), zM: clamp(point.zM, room.heightM) }
}
