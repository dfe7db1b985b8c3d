import { describe, expect, it } from 'vitest'
import { listeningDistanceM, speakerAngleDeg, stereoTriangleListener, stereoTriangleSpeakers, toeInAngleDeg } from '../../../shared/room/stereoTriangle'
import { expectWithin } from '../../helpers/tolerance'

const LISTENER = { xM: 2.5, yM: 2, zM: 1.2 }

describe('stereoTriangleSpeakers', () => {
  it('returns speakers at ±30° and at the base width from the listener and from each other', () => {
    const { left, right } = stereoTriangleSpeakers(LISTENER, 2)
    // equilateral stereo triangle, ±30° (common practice; ITU-R BS.775 layout — from memory — verify)
    expectWithin(speakerAngleDeg(left, LISTENER), -30, 1e-9)
    expectWithin(speakerAngleDeg(right, LISTENER), 30, 1e-9)
    expectWithin(listeningDistanceM(left, LISTENER), 2, 1e-12)
    expectWithin(listeningDistanceM(right, LISTENER), 2, 1e-12)
    expectWithin(Math.hypot(right.xM - left.xM, right.yM - left.yM), 2, 1e-12)
  })

  it('returns the hand-computed positions for a 2 m base', () => {
    // closed form: x = xl − b·cos30° = 2.5 − 1.7321, y = yl ∓ b/2
    const { left, right } = stereoTriangleSpeakers(LISTENER, 2)
    expectWithin(left.xM, 2.5 - Math.sqrt(3), 1e-12)
    expect([left.yM, right.yM, left.zM]).toEqual([1, 3, 1.2])
  })

  it('throws when the base width is not positive', () => {
    expect(() => stereoTriangleSpeakers(LISTENER, 0)).toThrow(RangeError)
  })
})

describe('stereoTriangleListener', () => {
  it('returns the apex that the speakers were built from (round trip)', () => {
    const apex = stereoTriangleListener(stereoTriangleSpeakers(LISTENER, 2.4))
    expectWithin(apex.xM, LISTENER.xM, 1e-12)
    expectWithin(apex.yM, LISTENER.yM, 1e-12)
  })
})

describe('toeInAngleDeg', () => {
  it('returns 30° for both speakers of the equilateral triangle', () => {
    // geometry: the line to the apex is 30° off the room axis in an equilateral triangle (closed form)
    const { left, right } = stereoTriangleSpeakers(LISTENER, 2)
    expectWithin(toeInAngleDeg(left, LISTENER), 30, 1e-9)
    expectWithin(toeInAngleDeg(right, LISTENER), 30, 1e-9)
  })
})
