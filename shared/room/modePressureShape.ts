import type { RoomDimensions, RoomPoint } from './roomGeometry'

/**
 * Pressure shape of a rigid-walled rectangular-room mode at a point:
 * ψ = cos(nx·π·x/L)·cos(ny·π·y/W)·cos(nz·π·z/H) (closed form; maxima ±1 at walls and corners,
 * nodes where any factor is zero, e.g. x = L/2 for nx = 1).
 */
export function modePressureShape(indices: readonly [number, number, number], room: RoomDimensions, point: RoomPoint): number {
  const [nx, ny, nz] = indices
  return (
    Math.cos((nx * Math.PI * point.xM) / room.lengthM) *
    Math.cos((ny * Math.PI * point.yM) / room.widthM) *
    Math.cos((nz * Math.PI * point.zM) / room.heightM)
  )
}

/**
 * Mean square of the mode shape over the room volume, Λ = Π (1 for a zero index, ½ otherwise)
 * (closed form: the mean of cos² is ½). Normalises the modal sum.
 */
export function modeShapeMeanSquare(indices: readonly [number, number, number]): number {
  return indices.reduce<number>((product, n) => product * (n === 0 ? 1 : 0.5), 1)
}
