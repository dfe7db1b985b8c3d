import { describe, expect, it } from 'vitest'
import { modeCountEstimate } from '../../../shared/room/modeCountEstimate'
import { roomModes } from '../../../shared/room/roomModes'

describe('modeCountEstimate', () => {
  it('returns a count within 3 % of the exact enumeration at 300 Hz', () => {
    // N ≈ 4πVf³/(3c³) + πSf²/(4c²) + Lf/(8c) (Sound Engineer's Pocket Book ch. 8 variables;
    // formula from memory — verify), checked against exact Rayleigh enumeration (closed form)
    const room = { lengthM: 5, widthM: 4, heightM: 2.5 }
    const exact = roomModes(room, { speedOfSoundMps: 343, maxHz: 300 }).length
    const estimate = modeCountEstimate(room, 300, 343)
    expect(Math.abs(estimate - exact) / exact).toBeLessThan(0.03)
  })

  it('returns the volume term alone for the leading order', () => {
    // leading term 4πV(f/c)³/3 (Weyl, closed form): at f = c (k = 1) for a unit cube the three
    // terms are 4π/3 + 6π/4 + 12/8
    expect(modeCountEstimate({ lengthM: 1, widthM: 1, heightM: 1 }, 343, 343)).toBeCloseTo((4 * Math.PI) / 3 + (6 * Math.PI) / 4 + 1.5, 12)
  })
})
