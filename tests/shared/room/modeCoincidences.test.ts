import { describe, expect, it } from 'vitest'
import { findModeCoincidences } from '../../../shared/room/modeCoincidences'
import { roomModes } from '../../../shared/room/roomModes'
import { expectWithin } from '../../helpers/tolerance'

const HANDBOOK_ROOM = { lengthM: 16, widthM: 12, heightM: 8 }

describe('findModeCoincidences', () => {
  it('returns the handbook coincidences at 70.6 Hz and 141.25 Hz among axial modes', () => {
    const axial = roomModes(HANDBOOK_ROOM, { speedOfSoundMps: 1130, maxHz: 200 }).filter((m) => m.type === 'axial')
    const groups = findModeCoincidences(axial)
    // Handbook for Sound Engineers Table 6-4: (2,0,0)/(0,0,1) at 70.6 Hz, (4,0,0)/(0,3,0)/(0,0,2) at 141.25 Hz
    expect(groups).toHaveLength(2)
    expectWithin(groups[0]!.frequencyHz, 70.6, 0.05)
    expect(groups[0]!.modes.map((m) => m.indices.join(',')).sort()).toEqual(['0,0,1', '2,0,0'])
    expectWithin(groups[1]!.frequencyHz, 141.25, 0.005)
    expect(groups[1]!.modes.map((m) => m.indices.join(',')).sort()).toEqual(['0,0,2', '0,3,0', '4,0,0'])
  })

  it('returns the next coincidence at 211.88 Hz when the range is extended', () => {
    // Handbook Table 6-4 height series 211.88 Hz = (0,0,3); (6,0,0) = 6·35.3125 Hz (Rayleigh, computed)
    const axial = roomModes(HANDBOOK_ROOM, { speedOfSoundMps: 1130, maxHz: 220 }).filter((m) => m.type === 'axial')
    const last = findModeCoincidences(axial).at(-1)!
    expectWithin(last.frequencyHz, 211.88, 0.01)
    expect(last.modes.map((m) => m.indices.join(',')).sort()).toEqual(['0,0,3', '6,0,0'])
  })

  it('groups near-coincident modes when given a tolerance in percent', () => {
    // Handbook room, computed: (1,1,1) 91.93 Hz and (0,2,0) 94.17 Hz are 2.4 % apart
    const modes = roomModes(HANDBOOK_ROOM, { speedOfSoundMps: 1130, maxHz: 95 })
    const tight = findModeCoincidences(modes, { tolerancePercent: 2 }).map((g) => g.modes.length)
    const loose = findModeCoincidences(modes, { tolerancePercent: 2.5 })
    expect(tight).toEqual([2, 2])
    expect(loose.some((g) => g.modes.some((m) => m.indices.join() === '1,1,1') && g.modes.some((m) => m.indices.join() === '0,2,0'))).toBe(true)
  })

  it('returns no groups when all modes are distinct', () => {
    // 5 × 4 × 2.5 m at c = 343: lowest axials 34.3, 42.9, 68.6 Hz (Rayleigh, computed) are distinct
    const modes = roomModes({ lengthM: 5, widthM: 4, heightM: 2.5 }, { speedOfSoundMps: 343, maxHz: 60 })
    expect(findModeCoincidences(modes, { toleranceHz: 0.5 })).toEqual([])
  })
})
