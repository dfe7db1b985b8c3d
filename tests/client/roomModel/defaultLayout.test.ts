import { describe, expect, it } from 'vitest'
import { listeningDistanceM, speakerAngleDeg } from '@shared/room'
import { defaultBaseWidthM, defaultLayout } from '@/roomModel/defaultLayout'
import { expectWithin } from '../../helpers/tolerance'

const room = { lengthM: 5, widthM: 4, heightM: 2.5 }

describe('defaultLayout', () => {
  it('returns the listener at 38 % of the length on the centre line at 1.2 m when the room is 5 × 4 × 2.5 m', () => {
    // 38 % rule and 1.2 m seated ear height: common practice.
    expect(defaultLayout(room).listener).toEqual({ xM: 1.9, yM: 2, zM: 1.2 })
  })

  it('returns speakers 0.5 m off the front wall when the front gap limits the spacing', () => {
    // b = min(0.45·4, (1.9 − 0.5)/cos 30°) = 1.6166 m; speakers at x = 1.9 − b·cos 30° = 0.5 m (geometry).
    expectWithin(defaultBaseWidthM(room, { xM: 1.9, yM: 2, zM: 1.2 }), 1.4 / Math.cos(Math.PI / 6), 1e-12)
    const [left, right] = defaultLayout(room).speakers
    expect(left).toMatchObject({ label: 'Left', xM: 0.5, yM: 1.192, zM: 1.2 })
    expect(right).toMatchObject({ label: 'Right', xM: 0.5, yM: 2.808, zM: 1.2 })
  })

  it('returns an equilateral triangle at ±30° when the speakers are placed', () => {
    // Equilateral triangle: all three sides equal, each speaker 30° off the listener's axis (geometry).
    const { listener, speakers } = defaultLayout(room)
    const [left, right] = speakers
    const baseM = Math.hypot(left!.xM - right!.xM, left!.yM - right!.yM)
    expectWithin(listeningDistanceM(left!, listener), baseM, 2e-3)
    expectWithin(listeningDistanceM(right!, listener), baseM, 2e-3)
    expectWithin(speakerAngleDeg(left!, listener), -30, 0.1)
    expectWithin(speakerAngleDeg(right!, listener), 30, 0.1)
  })

  it('returns a layout inside the room when the room is very small', () => {
    const tiny = { lengthM: 1.2, widthM: 1, heightM: 1 }
    const { listener, speakers } = defaultLayout(tiny, 18)
    for (const p of [listener, ...speakers]) {
      expect(p.xM).toBeGreaterThanOrEqual(0)
      expect(p.yM).toBeGreaterThanOrEqual(0)
      expect(p.yM).toBeLessThanOrEqual(1)
      expect(p.zM).toBeLessThanOrEqual(1)
    }
    expect(defaultLayout(tiny, 18).airTemperatureC).toBe(18)
  })
})
