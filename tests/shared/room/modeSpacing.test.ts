import { describe, expect, it } from 'vitest'
import { modeSpacing } from '../../../shared/room/modeSpacing'
import { roomModes } from '../../../shared/room/roomModes'
import { expectWithin } from '../../helpers/tolerance'

describe('modeSpacing', () => {
  it('returns the gaps between distinct handbook mode frequencies', () => {
    // Handbook for Sound Engineers Table 6-4 room (16 × 12 × 8 ft, c = 1130 ft/s): first modes
    // 35.3125, 47.0833, 58.854, 70.625 (×2) Hz (Rayleigh, computed) → gaps 11.77, 11.77, 11.77 Hz
    const modes = roomModes({ lengthM: 16, widthM: 12, heightM: 8 }, { speedOfSoundMps: 1130, maxHz: 71 })
    const gaps = modeSpacing(modes)
    expect(gaps).toHaveLength(3)
    gaps.forEach((gap) => expectWithin(gap.gapHz, 11.7708, 0.001))
  })

  it('returns no gaps for a single mode', () => {
    const modes = roomModes({ lengthM: 5, widthM: 4, heightM: 2.5 }, { speedOfSoundMps: 343, maxHz: 35 })
    expect(modeSpacing(modes)).toEqual([])
  })
})
