import { describe, expect, it } from 'vitest'
import { nudgePoint } from '@/roomModel/nudgePoint'

const room = { lengthM: 5, widthM: 4, heightM: 2.5 }
const listener = { xM: 1.9, yM: 2, zM: 1.2 }

describe('nudgePoint', () => {
  it('returns the point 5 cm further along the length when ArrowRight is pressed', () => {
    expect(nudgePoint(listener, 'ArrowRight', 'top', room)).toEqual({ xM: 1.95, yM: 2, zM: 1.2 })
    expect(nudgePoint(listener, 'ArrowLeft', 'side', room)).toEqual({ xM: 1.85, yM: 2, zM: 1.2 })
  })

  it('returns a move across the width in the top view and in height in the side view when ArrowUp is pressed', () => {
    expect(nudgePoint(listener, 'ArrowUp', 'top', room)).toEqual({ xM: 1.9, yM: 2.05, zM: 1.2 })
    expect(nudgePoint(listener, 'ArrowUp', 'side', room)).toEqual({ xM: 1.9, yM: 2, zM: 1.25 })
    expect(nudgePoint(listener, 'ArrowDown', 'side', room, 0.01)).toEqual({ xM: 1.9, yM: 2, zM: 1.19 })
  })

  it('returns whole millimetres when steps add up (no floating-point tails)', () => {
    let point = { xM: 0.1, yM: 0, zM: 0 }
    for (let i = 0; i < 3; i++) point = nudgePoint(point, 'ArrowRight', 'top', room)!
    expect(point.xM).toBe(0.25)
  })

  it('returns the point on the wall when a nudge would leave the room', () => {
    expect(nudgePoint({ xM: 0.02, yM: 3.98, zM: 2.48 }, 'ArrowLeft', 'top', room)!.xM).toBe(0)
    expect(nudgePoint({ xM: 0.02, yM: 3.98, zM: 2.48 }, 'ArrowUp', 'top', room)!.yM).toBe(4)
    expect(nudgePoint({ xM: 0.02, yM: 3.98, zM: 2.48 }, 'ArrowUp', 'side', room)!.zM).toBe(2.5)
  })

  it('returns null and keeps the speaker label when another key is pressed', () => {
    expect(nudgePoint(listener, 'Enter', 'top', room)).toBeNull()
    expect(nudgePoint({ label: 'Left', ...listener }, 'ArrowDown', 'top', room)).toEqual({ label: 'Left', xM: 1.9, yM: 1.95, zM: 1.2 })
  })
})
