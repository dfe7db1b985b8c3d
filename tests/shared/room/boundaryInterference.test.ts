import { describe, expect, it } from 'vitest'
import { boundaryInterference, boundaryNotchHz } from '../../../shared/room/boundaryInterference'
import { expectWithin } from '../../helpers/tolerance'

const ROOM = { lengthM: 5, widthM: 4, heightM: 2.5 }

describe('boundaryNotchHz', () => {
  it('returns 171.5 Hz for 0.5 m and 85.75 Hz for 1.0 m at c = 343', () => {
    // f = c/(4d) (common practice; facts check values 171.5 / 85.8 Hz)
    expectWithin(boundaryNotchHz(0.5, 343), 171.5, 0.1)
    expectWithin(boundaryNotchHz(1.0, 343), 85.8, 0.1)
  })
})

describe('boundaryInterference', () => {
  it('returns one notch per boundary, nearest first, from the speaker position', () => {
    const notches = boundaryInterference({ xM: 0.5, yM: 1, zM: 1.2 }, ROOM, { speedOfSoundMps: 343 })
    // distances by hand: front 0.5, side 1.0, floor 1.2, ceiling 1.3, right 3.0, rear 4.5 m; f = c/(4d)
    expect(notches.map((n) => n.boundary)).toEqual(['front wall', 'left side wall', 'floor', 'ceiling', 'right side wall', 'rear wall'])
    expectWithin(notches[0]!.firstNotchHz, 171.5, 0.1)
    expectWithin(notches[2]!.firstNotchHz, 343 / 4.8, 1e-9)
  })

  it('returns only nearby boundaries when given maxDistanceM', () => {
    const notches = boundaryInterference({ xM: 0.5, yM: 1, zM: 1.2 }, ROOM, { speedOfSoundMps: 343, maxDistanceM: 1.25 })
    expect(notches.map((n) => n.boundary)).toEqual(['front wall', 'left side wall', 'floor'])
  })

  it('throws when the speaker lies outside the room', () => {
    expect(() => boundaryInterference({ xM: 6, yM: 1, zM: 1 }, ROOM, { speedOfSoundMps: 343 })).toThrow(RangeError)
  })
})
