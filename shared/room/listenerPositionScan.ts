import { modalResponse, type ModalResponseOptions } from './modalResponse'
import type { RoomPoint } from './roomGeometry'

export interface ListenerScanOptions extends Omit<ModalResponseOptions, 'receiver'> {
  /** The listener's y and z are kept; x moves (default from 0.15·L to 0.85·L). */
  listener: RoomPoint
  xStartM?: number
  xEndM?: number
  /** Number of positions (default 29). */
  positionCount?: number
  /** Band over which smoothness is scored, Hz (default 30–200). */
  scoreMinHz?: number
  scoreMaxHz?: number
}

export interface ListenerScanPosition {
  listener: RoomPoint
  levelDb: number[]
  /** Standard deviation of levelDb over the score band, dB: lower = smoother. */
  smoothnessDb: number
}

export interface ListenerScan {
  frequencyHz: number[]
  positions: ListenerScanPosition[]
  /** Index into positions of the smoothest spot. */
  bestIndex: number
}

/** Population standard deviation, same units as the values. */
export function standardDeviation(values: readonly number[]): number {
  const mean = values.reduce((sum, v) => sum + v, 0) / values.length
  return Math.sqrt(values.reduce((sum, v) => sum + (v - mean) ** 2, 0) / values.length)
}

/**
 * Moves the listener along the room length and scores the predicted bass response at each
 * spot by the standard deviation of its level over 30–200 Hz (a smoothness measure chosen here;
 * common practice is to look for the flattest spot, no single published score). Response from
 * {@link modalResponse}; the smoothest spot is marked by bestIndex.
 */
export function listenerPositionScan(options: ListenerScanOptions): ListenerScan {
  const { listener, room, scoreMinHz = 30, scoreMaxHz = 200, positionCount = 29 } = options
  const xStartM = options.xStartM ?? 0.15 * room.lengthM
  const xEndM = options.xEndM ?? 0.85 * room.lengthM
  if (!(positionCount >= 1)) throw new RangeError('positionCount must be at least 1')
  let frequencyHz: number[] = []
  const positions = Array.from({ length: positionCount }, (_, i) => {
    const xM = positionCount === 1 ? xStartM : xStartM + ((xEndM - xStartM) * i) / (positionCount - 1)
    const receiver = { ...listener, xM }
    const response = modalResponse({ ...options, receiver })
    frequencyHz = response.frequencyHz
    const scored = response.levelDb.filter((_, k) => response.frequencyHz[k]! >= scoreMinHz && response.frequencyHz[k]! <= scoreMaxHz)
    if (scored.length === 0) throw new RangeError('no evaluated frequency lies inside the score band')
    return { listener: receiver, levelDb: response.levelDb, smoothnessDb: standardDeviation(scored) }
  })
  const bestIndex = positions.reduce((best, p, i) => (p.smoothnessDb < positions[best]!.smoothnessDb ? i : best), 0)
  return { frequencyHz, positions, bestIndex }
}
