import { describe, expect, it } from 'vitest'
import { clientToViewBox, fitPxPerM, planTransform } from '@/roomModel/planTransform'
import { expectWithin } from '../../helpers/tolerance'

describe('planTransform', () => {
  // Closed form: px = pad + u·s, py = pad + (V − v)·s (v drawn upwards).
  const top = planTransform({ spanUM: 5, spanVM: 4, pxPerM: 100, paddingPx: 20 })

  it('returns the corners of a 5 × 4 m plane at 100 px/m with 20 px padding', () => {
    expect(top.toPx(0, 0)).toEqual({ xPx: 20, yPx: 420 })
    expect(top.toPx(5, 4)).toEqual({ xPx: 520, yPx: 20 })
    expect([top.widthPx, top.heightPx]).toEqual([540, 440])
  })

  it('returns the metres it was given when a point goes to pixels and back', () => {
    const { xPx, yPx } = top.toPx(1.9, 2.35)
    const back = top.fromPx(xPx, yPx)
    expectWithin(back.uM, 1.9, 1e-12)
    expectWithin(back.vM, 2.35, 1e-12)
  })

  it('returns a point on the wall when the pointer goes past it', () => {
    expect(top.fromPx(-50, 900)).toEqual({ uM: 0, vM: 0 })
    expect(top.fromPx(999, -5)).toEqual({ uM: 5, vM: 4 })
  })
})

describe('fitPxPerM', () => {
  it('returns the scale set by the length when the room is long and low', () => {
    // (680 − 2·34)/5 = 122.4 px/m; (440 − 68)/4 = 93 px/m → the smaller wins.
    expect(fitPxPerM({ lengthM: 5, widthM: 4, heightM: 2.5 }, { maxWidthPx: 680, maxHeightPx: 440, paddingPx: 34 })).toBeCloseTo(93, 12)
    expect(fitPxPerM({ lengthM: 10, widthM: 3, heightM: 2.5 }, { maxWidthPx: 680, maxHeightPx: 440, paddingPx: 34 })).toBeCloseTo(61.2, 12)
  })
})

describe('clientToViewBox', () => {
  it('returns viewBox pixels when the SVG is drawn at half its viewBox size', () => {
    const rect = { left: 100, top: 50, width: 270, height: 220 }
    expect(clientToViewBox({ clientX: 235, clientY: 160 }, rect, { widthPx: 540, heightPx: 440 })).toEqual({ xPx: 270, yPx: 220 })
  })
})
