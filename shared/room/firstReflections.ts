import type { RoomBoundary } from './boundaryInterference'
import { assertPointInRoom, distanceM, type RoomDimensions, type RoomPoint } from './roomGeometry'

export interface ReflectionSpeaker {
  /** Label used in sentences, e.g. 'left'. */
  label: string
  position: RoomPoint
}

export interface PredictedReflection {
  speaker: string
  surface: RoomBoundary
  /** Image source (speaker mirrored across the surface), room coordinates, m. */
  imageSource: RoomPoint
  /** Where the image→listener line crosses the surface, m. */
  reflectionPoint: RoomPoint
  pathLengthM: number
  directLengthM: number
  /** Arrival after the direct sound, ms. */
  delayMs: number
  /** Level re the direct sound: 20·lg(direct/reflected) + 10·lg(1 − α), dB. */
  levelDb: number
}

export interface FirstReflectionOptions {
  speedOfSoundMps: number
  /** Broadband absorption coefficient per surface (default 0: rigid, spreading loss only). */
  absorption?: Partial<Record<RoomBoundary, number>>
}

type Axis = 'xM' | 'yM' | 'zM'

function surfacePlanes(room: RoomDimensions): [RoomBoundary, Axis, number][] {
  return [
    ['front wall', 'xM', 0],
    ['rear wall', 'xM', room.lengthM],
    ['left side wall', 'yM', 0],
    ['right side wall', 'yM', room.widthM],
    ['floor', 'zM', 0],
    ['ceiling', 'zM', room.heightM],
  ]
}

/**
 * First-order image-source reflections from each speaker to the listener on the six surfaces of
 * a rectangular room (coordinates: x along the length from the front wall, y across the width
 * from the left wall, z height from the floor; m). Mirror the speaker across the surface; the
 * reflection point is where the image→listener line crosses it (facts §10: for the wall y = 0,
 * x_r = xs + (xl − xs)·ys/(ys + yl)). Delay = (|image − listener| − |speaker − listener|)/c.
 * Level = spherical spreading 20·lg(d_direct/d_reflected) plus 10·lg(1 − α) for the surface
 * (geometric acoustics, common practice). Sorted by delay.
 */
export function firstReflections(
  speakers: readonly ReflectionSpeaker[],
  listener: RoomPoint,
  room: RoomDimensions,
  options: FirstReflectionOptions,
): PredictedReflection[] {
  assertPointInRoom(listener, room, 'listener')
  const { speedOfSoundMps, absorption = {} } = options
  const reflections: PredictedReflection[] = []
  for (const speaker of speakers) {
    assertPointInRoom(speaker.position, room, `speaker ${speaker.label}`)
    const directLengthM = distanceM(speaker.position, listener)
    for (const [surface, axis, plane] of surfacePlanes(room)) {
      const imageSource = { ...speaker.position, [axis]: 2 * plane - speaker.position[axis] }
      const span = listener[axis] - imageSource[axis]
      const fraction = span === 0 ? 0 : (plane - imageSource[axis]) / span
      const reflectionPoint = {
        xM: imageSource.xM + fraction * (listener.xM - imageSource.xM),
        yM: imageSource.yM + fraction * (listener.yM - imageSource.yM),
        zM: imageSource.zM + fraction * (listener.zM - imageSource.zM),
      }
      const pathLengthM = distanceM(imageSource, listener)
      const alpha = Math.min(absorption[surface] ?? 0, 0.999999)
      reflections.push({
        speaker: speaker.label,
        surface,
        imageSource,
        reflectionPoint: { ...reflectionPoint, [axis]: plane },
        pathLengthM,
        directLengthM,
        delayMs: ((pathLengthM - directLengthM) / speedOfSoundMps) * 1000,
        levelDb: 20 * Math.log10(directLengthM / pathLengthM) + 10 * Math.log10(1 - alpha),
      })
    }
  }
  return reflections.sort((a, b) => a.delayMs - b.delayMs)
}
