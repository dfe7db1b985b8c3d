import { assertRoomDimensions, type RoomDimensions } from './roomGeometry'

/** axial: one non-zero index; tangential: two; oblique: three. */
export type RoomModeType = 'axial' | 'tangential' | 'oblique'

export interface RoomMode {
  /** Mode indices [nx (length), ny (width), nz (height)]. */
  indices: [number, number, number]
  type: RoomModeType
  frequencyHz: number
}

export interface RoomModesOptions {
  speedOfSoundMps: number
  /** Highest mode frequency to list, Hz (default 300). */
  maxHz?: number
}

/**
 * Frequency of one rectangular-room mode (Rayleigh):
 * f = (c/2)·sqrt((nx/L)² + (ny/W)² + (nz/H)²)
 * [Handbook for Sound Engineers ch. 6; Sound Engineer's Pocket Book ch. 8].
 *
 * @returns frequency, Hz
 */
export function modeFrequencyHz(room: RoomDimensions, indices: readonly [number, number, number], speedOfSoundMps: number): number {
  const [nx, ny, nz] = indices
  return (speedOfSoundMps / 2) * Math.hypot(nx / room.lengthM, ny / room.widthM, nz / room.heightM)
}

/** Classifies a mode by its count of non-zero indices. */
export function roomModeType(indices: readonly [number, number, number]): RoomModeType {
  const nonZero = indices.filter((n) => n !== 0).length
  return nonZero === 1 ? 'axial' : nonZero === 2 ? 'tangential' : 'oblique'
}

/**
 * All axial, tangential and oblique modes of a rectangular room up to maxHz, sorted by
 * frequency (ties by type then indices, so the order is stable). Formula: {@link modeFrequencyHz}.
 * Dimensions and c may be in any one length unit (feet with ft/s works as well).
 */
export function roomModes(room: RoomDimensions, options: RoomModesOptions): RoomMode[] {
  assertRoomDimensions(room)
  const { speedOfSoundMps, maxHz = 300 } = options
  if (!(speedOfSoundMps > 0)) throw new RangeError('speedOfSoundMps must be positive')
  // An index cannot exceed the axial limit of its own dimension: n ≤ 2·L·f/c.
  const limit = (sideM: number) => Math.floor((2 * sideM * maxHz) / speedOfSoundMps + 1e-9)
  const modes: RoomMode[] = []
  for (let nx = 0; nx <= limit(room.lengthM); nx++) {
    for (let ny = 0; ny <= limit(room.widthM); ny++) {
      for (let nz = 0; nz <= limit(room.heightM); nz++) {
        if (nx + ny + nz === 0) continue
        const indices: [number, number, number] = [nx, ny, nz]
        const frequencyHz = modeFrequencyHz(room, indices, speedOfSoundMps)
        if (frequencyHz <= maxHz * (1 + 1e-12)) modes.push({ indices, type: roomModeType(indices), frequencyHz })
      }
    }
  }
  const typeOrder: Record<RoomModeType, number> = { axial: 0, tangential: 1, oblique: 2 }
  return modes.sort(
    (a, b) =>
      a.frequencyHz - b.frequencyHz ||
      typeOrder[a.type] - typeOrder[b.type] ||
      a.indices[0] - b.indices[0] ||
      a.indices[1] - b.indices[1] ||
      a.indices[2] - b.indices[2],
  )
}
