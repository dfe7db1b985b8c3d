import { modalBandwidthHz } from './modalBandwidth'
import { modePressureShape, modeShapeMeanSquare } from './modePressureShape'
import { assertPointInRoom, roomVolumeM3, type RoomDimensions, type RoomPoint } from './roomGeometry'
import { roomModes } from './roomModes'

export interface ModalResponseOptions {
  room: RoomDimensions
  /** One source, or several driven in phase (e.g. both speakers playing mono bass). */
  source: RoomPoint | readonly RoomPoint[]
  receiver: RoomPoint
  speedOfSoundMps: number
  /** Reverberation time that damps each mode, s: one value, or a function of the mode frequency. */
  reverberationTimeS: number | ((frequencyHz: number) => number)
  /** Frequencies to evaluate, Hz (default 20–300 Hz in 0.5 Hz steps). */
  frequenciesHz?: readonly number[]
  /** Highest mode in the sum, Hz (default 2 × the highest evaluated frequency, for the tails). */
  maxModeHz?: number
  /** Add the (0,0,0) pressure-chamber term (default false: real rooms leak at very low frequency). */
  includeZeroMode?: boolean
}

export interface ModalResponse {
  frequencyHz: number[]
  /** Level re the free-field level of the same source at 1 m, dB. */
  levelDb: number[]
  modeCount: number
}

/** Evenly spaced frequency grid, Hz, both ends included. */
export function linearFrequencyGrid(minHz: number, maxHz: number, stepHz: number): number[] {
  const count = Math.floor((maxHz - minHz) / stepHz + 1e-9) + 1
  return Array.from({ length: count }, (_, i) => minHz + i * stepHz)
}

/**
 * Low-frequency pressure response at a receiver in a rigid rectangular room, by modal sum for a
 * point source of constant volume acceleration (flat in free field):
 *
 * p(f)/p_free,1m = (c²/(π·V))·Σ_n ψ_n(src)·ψ_n(rcv) / (Λ_n·(f_n² − f² + j·B_n·f))
 *
 * ψ_n = cos·cos·cos mode shape, Λ_n its mean square, B_n = 2.2/T the modal bandwidth (closed
 * form; eigenfunction expansion of the Helmholtz equation as in room-acoustics textbooks, e.g.
 * Kuttruff "Room Acoustics" ch. 3). An estimate: walls are taken as rigid, the damping uniform.
 */
export function modalResponse(options: ModalResponseOptions): ModalResponse {
  const { room, receiver, speedOfSoundMps, reverberationTimeS, includeZeroMode = false } = options
  const sources = Array.isArray(options.source) ? (options.source as readonly RoomPoint[]) : [options.source as RoomPoint]
  sources.forEach((source, i) => assertPointInRoom(source, room, `source ${i + 1}`))
  assertPointInRoom(receiver, room, 'receiver')
  const frequencyHz = [...(options.frequenciesHz ?? linearFrequencyGrid(20, 300, 0.5))]
  const maxModeHz = options.maxModeHz ?? 2 * frequencyHz.reduce((high, f) => Math.max(high, f), -Infinity)
  const bandwidthAt = (f: number) => modalBandwidthHz(typeof reverberationTimeS === 'number' ? reverberationTimeS : reverberationTimeS(f))
  const terms = roomModes(room, { speedOfSoundMps, maxHz: maxModeHz }).map((mode) => ({
    weight: (sources.reduce((sum, s) => sum + modePressureShape(mode.indices, room, s), 0) * modePressureShape(mode.indices, room, receiver)) / modeShapeMeanSquare(mode.indices),
    frequencySquared: mode.frequencyHz ** 2,
    bandwidthHz: bandwidthAt(mode.frequencyHz),
  }))
  if (includeZeroMode) terms.push({ weight: sources.length, frequencySquared: 0, bandwidthHz: bandwidthAt(frequencyHz[0] ?? 20) })
  const scale = speedOfSoundMps ** 2 / (Math.PI * roomVolumeM3(room))
  const levelDb = frequencyHz.map((f) => {
    let re = 0
    let im = 0
    for (const term of terms) {
      const dRe = term.frequencySquared - f * f
      const dIm = term.bandwidthHz * f
      const k = term.weight / (dRe * dRe + dIm * dIm)
      re += k * dRe
      im -= k * dIm
    }
    return 20 * Math.log10(scale * Math.hypot(re, im) + 1e-12)
  })
  return { frequencyHz, levelDb, modeCount: terms.length }
}
