import type { RoomDimensions, RoomPoint } from './roomGeometry'

/** Seated ear height, m (common practice; 1.2 m in ITU-R BS.1116 — from memory — verify). */
export const SEATED_EAR_HEIGHT_M = 1.2

/** Fraction of the room length from the front wall for the "38 % rule" (common practice, no source). */
export const THIRTY_EIGHT_PERCENT_RULE = 0.38

/** Distance from a position to the front wall (x = 0), m. */
export function distanceToFrontWallM(position: RoomPoint): number {
  return position.xM
}

/** Distance from a position to the rear wall (x = L), m. */
export function distanceToRearWallM(position: RoomPoint, room: RoomDimensions): number {
  return room.lengthM - position.xM
}

/** Position as a fraction of the room length from the front wall (0…1). */
export function lengthFraction(position: RoomPoint, room: RoomDimensions): number {
  return position.xM / room.lengthM
}

/**
 * The "38 % rule" listening position: 0.38·L from the front wall, on the room's centre line
 * (y = W/2), at seated ear height (common practice, no source — a starting point to check with
 * the modal estimate and a measurement, not an optimum).
 */
export function thirtyEightPercentPosition(room: RoomDimensions, earHeightM = SEATED_EAR_HEIGHT_M): RoomPoint {
  return { xM: THIRTY_EIGHT_PERCENT_RULE * room.lengthM, yM: room.widthM / 2, zM: Math.min(earHeightM, room.heightM) }
}
