import { describe, expect, it } from 'vitest'
import { firstReflections } from '../../../shared/room/firstReflections'
import { expectWithin } from '../../helpers/tolerance'

const ROOM = { lengthM: 5, widthM: 4, heightM: 2.5 }
const SPEAKER = { label: 'left', position: { xM: 1, yM: 1, zM: 1.2 } }
const LISTENER = { xM: 3, yM: 2, zM: 1.2 }
const C = 343

function reflectionOn(surface: string, options = {}) {
  const found = firstReflections([SPEAKER], LISTENER, ROOM, { speedOfSoundMps: C, ...options }).find((r) => r.surface === surface)
  if (!found) throw new Error(`no reflection on ${surface}`)
  return found
}

describe('firstReflections', () => {
  it('returns the left side wall point from the mirror formula', () => {
    // facts §10 (wall at distance-coordinate 0): point = s + (l − s)·d_s/(d_s + d_l) along the wall;
    // here along x with wall distances ys = 1, yl = 2 → x_r = 1 + 2·1/3 = 1.6667 m, at y = 0
    const reflection = reflectionOn('left side wall')
    expectWithin(reflection.reflectionPoint.xM, 1 + (2 * 1) / 3, 1e-12)
    expect(reflection.reflectionPoint.yM).toBe(0)
    expectWithin(reflection.reflectionPoint.zM, 1.2, 1e-12)
    expect(reflection.imageSource).toEqual({ xM: 1, yM: -1, zM: 1.2 })
  })

  it('returns path length, delay and level for the left side wall by hand', () => {
    // image (1, −1, 1.2): path sqrt(2² + 3²) = 3.6056 m; direct sqrt(5) = 2.2361 m (geometry)
    // delay = (path − direct)/c = 3.993 ms; level = 20·lg(direct/path) = −4.150 dB (facts §10)
    const reflection = reflectionOn('left side wall')
    expectWithin(reflection.pathLengthM, Math.sqrt(13), 1e-12)
    expectWithin(reflection.directLengthM, Math.sqrt(5), 1e-12)
    expectWithin(reflection.delayMs, ((Math.sqrt(13) - Math.sqrt(5)) / C) * 1000, 1e-9)
    expectWithin(reflection.delayMs, 3.993, 0.001)
    expectWithin(reflection.levelDb, -4.15, 0.001)
  })

  it('returns the points on the right wall, front wall, floor and ceiling by the mirror formula', () => {
    // facts §10 formula with wall distances: right wall (3, 2) → x_r = 1 + 2·3/5 = 2.2;
    // front wall (1, 3) → y_r = 1 + 1·1/4 = 1.25; floor and ceiling at equal heights → midpoint (2, 1.5)
    expectWithin(reflectionOn('right side wall').reflectionPoint.xM, 2.2, 1e-12)
    expect(reflectionOn('right side wall').reflectionPoint.yM).toBe(4)
    expectWithin(reflectionOn('front wall').reflectionPoint.yM, 1.25, 1e-12)
    const floor = reflectionOn('floor')
    expectWithin(floor.reflectionPoint.xM, 2, 1e-12)
    expectWithin(floor.reflectionPoint.yM, 1.5, 1e-12)
    expectWithin(floor.pathLengthM, Math.sqrt(5 + 2.4 ** 2), 1e-12)
    expectWithin(reflectionOn('ceiling').pathLengthM, Math.sqrt(5 + 2.6 ** 2), 1e-12)
  })

  it('returns 3.01 dB less when the surface absorbs half the energy', () => {
    // 10·lg(1 − α) with α = 0.5 = −3.0103 dB (closed form)
    const bare = reflectionOn('ceiling')
    const treated = reflectionOn('ceiling', { absorption: { ceiling: 0.5 } })
    expectWithin(bare.levelDb - treated.levelDb, 10 * Math.log10(2), 1e-9)
  })

  it('returns six reflections per speaker sorted by delay, all after the direct sound', () => {
    const right = { label: 'right', position: { xM: 1, yM: 3, zM: 1.2 } }
    const reflections = firstReflections([SPEAKER, right], LISTENER, ROOM, { speedOfSoundMps: C })
    expect(reflections).toHaveLength(12)
    expect(reflections.every((r, i) => r.delayMs > 0 && (i === 0 || r.delayMs >= reflections[i - 1]!.delayMs))).toBe(true)
  })

  it('throws when the listener lies outside the room', () => {
    expect(() => firstReflections([SPEAKER], { xM: 9, yM: 1, zM: 1 }, ROOM, { speedOfSoundMps: C })).toThrow(RangeError)
  })
})
