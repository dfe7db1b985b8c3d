import { describe, expect, it } from 'vitest'
import { modeFrequencyHz, roomModes } from '../../../shared/room/roomModes'
import { expectWithin } from '../../helpers/tolerance'

// Handbook for Sound Engineers, ch. 6 "Small Room Acoustics", Table 6-4: 16 × 12 × 8 ft, c = 1130 ft/s
const HANDBOOK_ROOM = { lengthM: 16, widthM: 12, heightM: 8 }
const HANDBOOK_C = 1130

describe('roomModes', () => {
  it('returns the handbook axial series for length, width and height', () => {
    const modes = roomModes(HANDBOOK_ROOM, { speedOfSoundMps: HANDBOOK_C, maxHz: 220 })
    const axial = (pick: (i: [number, number, number]) => boolean) =>
      modes.filter((m) => m.type === 'axial' && pick(m.indices)).map((m) => m.frequencyHz)
    // Handbook for Sound Engineers Table 6-4: length 35.31, 70.63, 105.94; width 47.08, 94.17,
    // 141.25; height 70.63, 141.25, 211.88 Hz (printed to 0.01 Hz)
    const expectSeries = (actual: number[], expected: number[]) => expected.forEach((f, i) => expectWithin(actual[i]!, f, 0.01))
    expectSeries(axial((i) => i[0] > 0), [35.31, 70.63, 105.94])
    expectSeries(axial((i) => i[1] > 0), [47.08, 94.17, 141.25])
    expectSeries(axial((i) => i[2] > 0), [70.63, 141.25, 211.88])
  })

  it('returns the first modes of all types in the computed handbook order', () => {
    const modes = roomModes(HANDBOOK_ROOM, { speedOfSoundMps: HANDBOOK_C, maxHz: 95 })
    // facts §7 (computed from the handbook room): 35.31 (1,0,0), 47.08 (0,1,0), 58.85 (1,1,0),
    // 70.625 ×2, 78.96 (1,0,1), 84.88 ×2, 91.93 (1,1,1) oblique, 94.17 (0,2,0)
    const expected: [number, string][] = [
      [35.31, 'axial'], [47.08, 'axial'], [58.85, 'tangential'], [70.625, 'axial'], [70.625, 'axial'],
      [78.96, 'tangential'], [84.88, 'tangential'], [84.88, 'tangential'], [91.93, 'oblique'], [94.17, 'axial'],
    ]
    expect(modes).toHaveLength(expected.length)
    expected.forEach(([f, type], i) => {
      expectWithin(modes[i]!.frequencyHz, f, 0.01)
      expect(modes[i]!.type).toBe(type)
    })
  })

  it('returns 87.87 Hz for the (1,1,1) mode of a 5 × 4 × 2.5 m room at c = 343 m/s', () => {
    // Rayleigh formula f = (c/2)·sqrt(Σ(n/L)²) (facts check values, computed)
    expectWithin(modeFrequencyHz({ lengthM: 5, widthM: 4, heightM: 2.5 }, [1, 1, 1], 343), 87.87, 0.01)
  })

  it('returns every mode below maxHz sorted, and none above', () => {
    const room = { lengthM: 5, widthM: 4, heightM: 2.5 }
    const modes = roomModes(room, { speedOfSoundMps: 343 })
    // brute force with the Rayleigh formula (closed form) to 300 Hz
    let count = 0
    for (let nx = 0; nx < 10; nx++) for (let ny = 0; ny < 10; ny++) for (let nz = 0; nz < 10; nz++) {
      if (nx + ny + nz > 0 && modeFrequencyHz(room, [nx, ny, nz], 343) <= 300) count++
    }
    expect(modes).toHaveLength(count)
    expect(modes.every((m, i) => i === 0 || m.frequencyHz >= modes[i - 1]!.frequencyHz)).toBe(true)
    expect(modes[modes.length - 1]!.frequencyHz).toBeLessThanOrEqual(300)
  })

  it('throws when a dimension is not positive', () => {
    expect(() => roomModes({ lengthM: 0, widthM: 4, heightM: 2.5 }, { speedOfSoundMps: 343 })).toThrow(RangeError)
  })
})
