import { describe, expect, it } from 'vitest'
import { distanceToFrontWallM, distanceToRearWallM, lengthFraction, thirtyEightPercentPosition } from '../../../shared/room/listeningPosition'
import { expectWithin } from '../../helpers/tolerance'

const ROOM = { lengthM: 6, widthM: 4, heightM: 2.6 }

describe('thirtyEightPercentPosition', () => {
  it('returns 0.38·L from the front wall on the centre line at ear height', () => {
    // 38 % rule (common practice, no source; facts §10); ear height 1.2 m (common practice)
    const position = thirtyEightPercentPosition(ROOM)
    expectWithin(position.xM, 2.28, 1e-12)
    expect(position.yM).toBe(2)
    expect(position.zM).toBe(1.2)
    expectWithin(lengthFraction(position, ROOM), 0.38, 1e-12)
  })

  it('returns an ear height no higher than the ceiling', () => {
    expect(thirtyEightPercentPosition({ lengthM: 3, widthM: 2, heightM: 1 }).zM).toBe(1)
  })
})

describe('distanceToFrontWallM', () => {
  it('returns x, and the rear distance L − x', () => {
    // room coordinates: x measured from the front wall (definition)
    const position = { xM: 2.5, yM: 2, zM: 1.2 }
    expect(distanceToFrontWallM(position)).toBe(2.5)
    expect(distanceToRearWallM(position, ROOM)).toBe(3.5)
  })
})
