import { describe, expect, it } from 'vitest'
import { modalBandwidthHz } from '../../../shared/room/modalBandwidth'
import { linearFrequencyGrid, modalResponse } from '../../../shared/room/modalResponse'
import { expectWithin } from '../../helpers/tolerance'

const ROOM = { lengthM: 5, widthM: 4, heightM: 2.5 }
const C = 343

/** Index of the largest value within ±windowHz of targetHz. */
function peakNear(frequencyHz: number[], levelDb: number[], targetHz: number, windowHz: number): number {
  let best = -1
  frequencyHz.forEach((f, i) => {
    if (Math.abs(f - targetHz) <= windowHz && (best < 0 || levelDb[i]! > levelDb[best]!)) best = i
  })
  return best
}

describe('modalBandwidthHz', () => {
  it('returns 2.2/T', () => {
    // B = δ/π with δ = 3·ln10/T ≈ 6.9/T (standard textbook relation, closed form)
    expectWithin(modalBandwidthHz(0.5), 4.3977, 1e-4)
    expectWithin(modalBandwidthHz(1), 2.2, 0.01)
  })
})

describe('modalResponse', () => {
  it('returns the closed-form 1-D tube response when only length modes are in range', () => {
    // Rigid tube (closed form): Σ ε_n cos(k_n·xs)cos(k_n·x)/(k_n² − k²) = L·cos(k·xs)cos(k(L − x))/(k·sin kL)
    // for xs < x, so p/p_free,1m = (4π/(W·H))·|cos(k·xs)cos(k(L − x))/(k·sin kL)|. Cross modes of a
    // 0.2 m section start at 857 Hz, above maxModeHz; light damping (T = 100 s) and the n = 0 term.
    const tube = { lengthM: 8, widthM: 0.2, heightM: 0.2 }
    const [xs, x] = [1.3, 5.1]
    const response = modalResponse({
      room: tube,
      source: { xM: xs, yM: 0.1, zM: 0.1 },
      receiver: { xM: x, yM: 0.05, zM: 0.15 },
      speedOfSoundMps: C,
      reverberationTimeS: 100,
      frequenciesHz: [30, 55, 100],
      maxModeHz: 850,
      includeZeroMode: true,
    })
    response.frequencyHz.forEach((f, i) => {
      const k = (2 * Math.PI * f) / C
      const green = (Math.cos(k * xs) * Math.cos(k * (8 - x))) / (k * Math.sin(k * 8))
      expectWithin(response.levelDb[i]!, 20 * Math.log10(((4 * Math.PI) / 0.04) * Math.abs(green)), 0.01)
    })
  })

  it('returns peaks at the lowest mode frequencies for a corner-to-corner layout', () => {
    const response = modalResponse({ room: ROOM, source: { xM: 0, yM: 0, zM: 0 }, receiver: { xM: 5, yM: 4, zM: 2.5 }, speedOfSoundMps: C, reverberationTimeS: 1.5 })
    // Rayleigh (closed form): (1,0,0) 34.30 Hz, (0,1,0) 42.875 Hz; corners excite every mode; T = 1.5 s
    // keeps B = 1.5 Hz narrow so neighbouring modes barely pull the peaks
    for (const modeHz of [34.3, 42.875]) {
      const i = peakNear(response.frequencyHz, response.levelDb, modeHz, 3)
      expect(Math.abs(response.frequencyHz[i]! - modeHz)).toBeLessThanOrEqual(0.5)
      expect(response.levelDb[i]!).toBeGreaterThan(response.levelDb[i - 4]!)
      expect(response.levelDb[i]!).toBeGreaterThan(response.levelDb[i + 4]!)
    }
  })

  it('returns no peak for the first length mode at its pressure node x = L/2', () => {
    // cos(π·x/L) = 0 at x = L/2 (closed form): the (1,0,0) mode is absent at the centre; tube as above
    const tube = { lengthM: 8, widthM: 0.2, heightM: 0.2 }
    const firstModeHz = C / 16
    const base = { room: tube, source: { xM: 0, yM: 0.1, zM: 0.1 }, speedOfSoundMps: C, reverberationTimeS: 1, frequenciesHz: linearFrequencyGrid(15, 50, 0.25), maxModeHz: 800 }
    const atCentre = modalResponse({ ...base, receiver: { xM: 4, yM: 0.1, zM: 0.1 } })
    const atWall = modalResponse({ ...base, receiver: { xM: 8, yM: 0.1, zM: 0.1 } })
    const i = atCentre.frequencyHz.findIndex((f) => Math.abs(f - firstModeHz) < 0.13)
    expect(atWall.levelDb[i]! - atCentre.levelDb[i]!).toBeGreaterThan(20)
    const centrePeak = peakNear(atCentre.frequencyHz, atCentre.levelDb, firstModeHz, 3)
    expect(Math.abs(atCentre.frequencyHz[centrePeak]! - firstModeHz)).toBeGreaterThan(2)
  })

  it('returns the same response with source and receiver swapped', () => {
    // reciprocity of the modal sum (closed form: the sum is symmetric in source and receiver)
    const a = { xM: 0.7, yM: 1.1, zM: 1.2 }
    const b = { xM: 3.2, yM: 2.3, zM: 1.1 }
    const ab = modalResponse({ room: ROOM, source: a, receiver: b, speedOfSoundMps: C, reverberationTimeS: 0.4 })
    const ba = modalResponse({ room: ROOM, source: b, receiver: a, speedOfSoundMps: C, reverberationTimeS: 0.4 })
    ab.levelDb.forEach((level, i) => expectWithin(level, ba.levelDb[i]!, 1e-9))
  })

  it('returns the same response when the layout is mirrored along the length', () => {
    // cos(nπ(L − x)/L) = (−1)^n·cos(nπx/L): the product at source and receiver is unchanged (closed form)
    const run = (sx: number, rx: number) =>
      modalResponse({ room: ROOM, source: { xM: sx, yM: 1, zM: 1.2 }, receiver: { xM: rx, yM: 2, zM: 1.2 }, speedOfSoundMps: C, reverberationTimeS: 0.4 })
    const original = run(0.6, 2.1)
    const mirrored = run(5 - 0.6, 5 - 2.1)
    original.levelDb.forEach((level, i) => expectWithin(level, mirrored.levelDb[i]!, 1e-9))
  })

  it('returns a 20–300 Hz grid in 0.5 Hz steps by default', () => {
    const response = modalResponse({ room: ROOM, source: { xM: 0, yM: 0, zM: 0 }, receiver: { xM: 2, yM: 2, zM: 1.2 }, speedOfSoundMps: C, reverberationTimeS: 0.4 })
    expect(response.frequencyHz).toHaveLength(561)
    expect([response.frequencyHz[0], response.frequencyHz.at(-1)]).toEqual([20, 300])
    expect(response.levelDb.every(Number.isFinite)).toBe(true)
  })

  it('throws when the receiver lies outside the room', () => {
    expect(() => modalResponse({ room: ROOM, source: { xM: 0, yM: 0, zM: 0 }, receiver: { xM: 6, yM: 2, zM: 1 }, speedOfSoundMps: C, reverberationTimeS: 0.4 })).toThrow(RangeError)
  })
})
