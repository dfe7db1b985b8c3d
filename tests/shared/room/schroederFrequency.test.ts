import { describe, expect, it } from 'vitest'
import { schroederFrequencyHz } from '../../../shared/room/schroederFrequency'
import { expectWithin } from '../../helpers/tolerance'

describe('schroederFrequencyHz', () => {
  it('returns 154.9 Hz for V = 50 m³ and T = 0.3 s', () => {
    // f_s = 2000·sqrt(T/V), "Room Acoustics" Eq. 3.44 (facts check values)
    expectWithin(schroederFrequencyHz(0.3, 50), 154.9, 0.1)
  })

  it('returns the other facts examples', () => {
    // facts §7 (computed): V = 100, T = 0.3 → 110 Hz; V = 30, T = 0.25 → 183 Hz
    expectWithin(schroederFrequencyHz(0.3, 100), 110, 0.5)
    expectWithin(schroederFrequencyHz(0.25, 30), 183, 0.5)
  })

  it('throws when the volume is zero', () => {
    expect(() => schroederFrequencyHz(0.3, 0)).toThrow(RangeError)
  })
})
