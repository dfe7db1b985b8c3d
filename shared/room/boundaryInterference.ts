import { assertPointInRoom, type RoomDimensions, type RoomPoint } from './roomGeometry'

export type RoomBoundary = 'front wall' | 'rear wall' | 'left side wall' | 'right side wall' | 'floor' | 'ceiling'

export interface BoundaryNotch {
  boundary: RoomBoundary
  /** Driver-to-boundary distance, m. */
  distanceM: number
  /** First cancellation frequency c/(4d), Hz (Infinity for d = 0: no notch, only gain). */
  firstNotchHz: number
}

/**
 * First speaker-boundary interference notch: f = c/(4d), where the reflected path 2d is half a
 * wavelength (common practice; facts §10: d = 0.5 m → 171.5 Hz at c = 343).
 */
export function boundaryNotchHz(distanceM: number, speedOfSoundMps: number): number {
  return speedOfSoundMps / (4 * distanceM)
}

/**
 * The first interference notch for each of the six boundaries of a rectangular room, nearest
 * boundary (highest notch) first. Speaker position in room coordinates (x from the front wall,
 * y from the left wall, z from the floor; m). Pass `maxDistanceM` to keep only nearby boundaries.
 */
export function boundaryInterference(
  speaker: RoomPoint,
  room: RoomDimensions,
  options: { speedOfSoundMps: number; maxDistanceM?: number },
): BoundaryNotch[] {
  assertPointInRoom(speaker, room, 'speaker')
  const { speedOfSoundMps, maxDistanceM = Infinity } = options
  const distances: [RoomBoundary, number][] = [
    ['front wall', speaker.xM],
    ['rear wall', room.lengthM - speaker.xM],
    ['left side wall', speaker.yM],
    ['right side wall', room.widthM - speaker.yM],
    ['floor', speaker.zM],
    ['ceiling', room.heightM - speaker.zM],
  ]
  return distances
    .filter(([, d]) => d <= maxDistanceM)
    .sort((a, b) => a[1] - b[1])
    .map(([boundary, d]) => ({ boundary, distanceM: d, firstNotchHz: boundaryNotchHz(d, speedOfSoundMps) }))
}
