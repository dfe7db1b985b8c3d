import type { RoomPoint } from './roomGeometry'

/** Half the angle between the two loudspeakers seen from the listener, degrees. */
export const STEREO_HALF_ANGLE_DEG = 30

export interface StereoPair {
  left: RoomPoint
  right: RoomPoint
}

const DEG = Math.PI / 180

/**
 * Loudspeaker positions of an equilateral stereo triangle for a listener facing the front wall
 * (−x): both speakers at baseWidthM from the listener and from each other, at ±30° — common
 * practice; ±30° is the ITU-R BS.775 / BS.1116 front-pair layout (from memory — verify).
 * Speakers take the listener's height (tweeter at ear height, ~1.2 m seated: common practice).
 *
 * Left speaker = smaller y (left of the listener), at (xl − b·cos30°, yl − b/2).
 *
 * @param listener - listening position, room coordinates (m)
 * @param baseWidthM - speaker-to-speaker distance = listening distance, m
 */
export function stereoTriangleSpeakers(listener: RoomPoint, baseWidthM: number): StereoPair {
  if (!(baseWidthM > 0)) throw new RangeError('baseWidthM must be positive')
  const depthM = baseWidthM * Math.cos(STEREO_HALF_ANGLE_DEG * DEG)
  return {
    left: { xM: listener.xM - depthM, yM: listener.yM - baseWidthM / 2, zM: listener.zM },
    right: { xM: listener.xM - depthM, yM: listener.yM + baseWidthM / 2, zM: listener.zM },
  }
}

/**
 * Listening position at the apex of the equilateral triangle in front of a speaker pair:
 * midpoint of the pair moved b·cos30° into the room (+x), b = distance between the speakers.
 */
export function stereoTriangleListener(pair: StereoPair): RoomPoint {
  const baseWidthM = Math.hypot(pair.right.xM - pair.left.xM, pair.right.yM - pair.left.yM)
  return {
    xM: (pair.left.xM + pair.right.xM) / 2 + baseWidthM * Math.cos(STEREO_HALF_ANGLE_DEG * DEG),
    yM: (pair.left.yM + pair.right.yM) / 2,
    zM: (pair.left.zM + pair.right.zM) / 2,
  }
}

/**
 * Horizontal angle of a speaker seen from the listener, degrees from straight ahead (−x):
 * negative to the left, positive to the right (−30 / +30 in the equilateral triangle).
 */
export function speakerAngleDeg(speaker: RoomPoint, listener: RoomPoint): number {
  return Math.atan2(speaker.yM - listener.yM, listener.xM - speaker.xM) / DEG
}

/**
 * Toe-in: how far a speaker must turn from facing straight down the room (+x) to aim at the
 * listener, degrees (30° in the equilateral triangle); positive = turned toward the room's centre
 * line through the listener.
 */
export function toeInAngleDeg(speaker: RoomPoint, listener: RoomPoint): number {
  return Math.atan2(Math.abs(listener.yM - speaker.yM), listener.xM - speaker.xM) / DEG
}

/** Horizontal distance from speaker to listener, m (the listening distance). */
export function listeningDistanceM(speaker: RoomPoint, listener: RoomPoint): number {
  return Math.hypot(listener.xM - speaker.xM, listener.yM - speaker.yM)
}
