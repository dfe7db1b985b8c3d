import type { LayoutDto } from '@shared/api'
import { SEATED_EAR_HEIGHT_M, STEREO_HALF_ANGLE_DEG, stereoTriangleSpeakers, thirtyEightPercentPosition, type RoomDimensions, type RoomPoint } from '@shared/room'
import { clampToRoom } from './clampToRoom'

/** Starting gaps of the default layout (our choice, to be moved by the user): speakers this far off the front wall, m. */
export const DEFAULT_FRONT_GAP_M = 0.5
/** Speaker spacing of the default layout as a fraction of the room width (our choice). */
export const DEFAULT_BASE_WIDTH_FRACTION = 0.45
/** Upper and lower bounds on the default speaker spacing, m (our choice: a near-field to mid-field pair). */
export const DEFAULT_BASE_WIDTH_RANGE_M: [number, number] = [0.6, 2.5]

const COS_HALF_ANGLE = Math.cos((STEREO_HALF_ANGLE_DEG * Math.PI) / 180)

/**
 * Speaker spacing (= listening distance) for an equilateral triangle with its listener at `listener`:
 * 0.45·W, but no closer to the front wall than 0.5 m, within 0.6–2.5 m.
 */
export function defaultBaseWidthM(room: RoomDimensions, listener: RoomPoint): number {
  const [minM, maxM] = DEFAULT_BASE_WIDTH_RANGE_M
  const byWidth = DEFAULT_BASE_WIDTH_FRACTION * room.widthM
  const byFrontGap = (listener.xM - DEFAULT_FRONT_GAP_M) / COS_HALF_ANGLE
  return Math.min(Math.max(Math.min(byWidth, byFrontGap), minM), maxM)
}

/** Two speakers of an equilateral triangle around a listener, kept inside the room. */
export function triangleSpeakers(listener: RoomPoint, baseWidthM: number, room: RoomDimensions): LayoutDto['speakers'] {
  const pair = stereoTriangleSpeakers(listener, baseWidthM)
  return [clampToRoom({ label: 'Left', ...pair.left }, room), clampToRoom({ label: 'Right', ...pair.right }, room)]
}

/**
 * The layout shown before one is saved: listener at the 38 % position (0.38·L from the front wall
 * on the centre line, common practice), ears at 1.2 m (common practice), speakers in an
 * equilateral triangle (geometry: ±30°) at the spacing of {@link defaultBaseWidthM}.
 */
export function defaultLayout(room: RoomDimensions, airTemperatureC = 20): LayoutDto {
  const listener = clampToRoom(thirtyEightPercentPosition(room, SEATED_EAR_HEIGHT_M), room)
  return { speakers: triangleSpeakers(listener, defaultBaseWidthM(room, listener), room), listener, airTemperatureC }
}
