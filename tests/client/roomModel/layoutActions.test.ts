import { describe, expect, it } from 'vitest'
import type { LayoutDto } from '@shared/api'
import { listeningDistanceM, speakerAngleDeg } from '@shared/room'
import { atEarHeight, equilateralListener, equilateralSpeakers, listenerAtThirtyEightPercent, meanListeningDistanceM } from '@/roomModel/layoutActions'
import { expectWithin } from '../../helpers/tolerance'

const room = { lengthM: 6, widthM: 4, heightM: 2.7 }
const layout: LayoutDto = {
  speakers: [
    { label: 'Left', xM: 0.8, yM: 1.2, zM: 1.0 },
    { label: 'Right', xM: 1.0, yM: 2.9, zM: 1.1 },
  ],
  listener: { xM: 2.6, yM: 2.0, zM: 1.2 },
  airTemperatureC: 20,
}

describe('equilateralSpeakers', () => {
  it('returns speakers at ±30° and at the old mean distance when the listener stays', () => {
    // Equilateral triangle (geometry): speaker spacing = listening distance, ±30° from the axis.
    const distanceM = meanListeningDistanceM(layout)!
    const next = equilateralSpeakers(layout, room)
    expect(next.listener).toEqual(layout.listener)
    expect(next.speakers.map((s) => s.label)).toEqual(['Left', 'Right'])
    for (const s of next.speakers) expectWithin(listeningDistanceM(s, next.listener), distanceM, 2e-3)
    expectWithin(speakerAngleDeg(next.speakers[0]!, next.listener), -30, 0.1)
    expectWithin(speakerAngleDeg(next.speakers[1]!, next.listener), 30, 0.1)
  })
})

describe('equilateralListener', () => {
  it('returns the listener at the apex b·cos 30° in front of the pair when the speakers stay', () => {
    const pair: LayoutDto = { ...layout, speakers: [{ label: 'Left', xM: 1, yM: 1, zM: 1.2 }, { label: 'Right', xM: 1, yM: 3, zM: 1.2 }] }
    // Apex of an equilateral triangle on a 2 m base: midpoint + 2·cos 30° = 1 + 1.732 m (geometry).
    expect(equilateralListener(pair, room).listener).toEqual({ xM: 2.732, yM: 2, zM: 1.2 })
  })
})

describe('atEarHeight', () => {
  it('returns every tweeter and the ears at 1.2 m (common practice) when the ceiling is higher', () => {
    const next = atEarHeight(layout, room)
    expect([next.listener.zM, ...next.speakers.map((s) => s.zM)]).toEqual([1.2, 1.2, 1.2])
  })

  it('returns the ceiling height when the room is lower than ear height', () => {
    expect(atEarHeight(layout, { ...room, heightM: 1.1 }).listener.zM).toBe(1.1)
  })
})

describe('listenerAtThirtyEightPercent', () => {
  it('returns the listener at 0.38·L from the front wall (common practice) when y and z are kept', () => {
    expect(listenerAtThirtyEightPercent(layout, room).listener).toEqual({ xM: 2.28, yM: 2, zM: 1.2 })
  })
})
