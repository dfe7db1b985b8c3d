import { roomSurfaceAreaM2, roomVolumeM3, type RoomDimensions } from './roomGeometry'

/**
 * Estimated number of room modes below a frequency:
 * N ≈ 4πV·f³/(3c³) + πS·f²/(4c²) + L·f/(8c), S = 2(LW + WH + HL), L = 4(L + W + H) (total edge
 * length). Variables as in Sound Engineer's Pocket Book ch. 8; the formula itself is from
 * memory — verify (facts §7). Compare with `roomModes(...).length` for the exact count.
 *
 * @returns estimated mode count below frequencyHz (not rounded)
 */
export function modeCountEstimate(room: RoomDimensions, frequencyHz: number, speedOfSoundMps: number): number {
  const volume = roomVolumeM3(room)
  const surface = roomSurfaceAreaM2(room)
  const edges = 4 * (room.lengthM + room.widthM + room.heightM)
  const k = frequencyHz / speedOfSoundMps
  return (4 * Math.PI * volume * k ** 3) / 3 + (Math.PI * surface * k ** 2) / 4 + (edges * k) / 8
}
