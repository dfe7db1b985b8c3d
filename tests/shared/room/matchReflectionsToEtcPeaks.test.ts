import { describe, expect, it } from 'vitest'
import { firstReflections } from '../../../shared/room/firstReflections'
import { matchReflectionsToEtcPeaks } from '../../../shared/room/matchReflectionsToEtcPeaks'

const ROOM = { lengthM: 5, widthM: 4, heightM: 2.5 }
const LISTENER = { xM: 3, yM: 2, zM: 1.2 }
const SPEAKERS = [
  { label: 'left', position: { xM: 1, yM: 1, zM: 1.2 } },
  { label: 'right', position: { xM: 1, yM: 2.6, zM: 1.2 } },
]
const PREDICTED = firstReflections(SPEAKERS, LISTENER, ROOM, { speedOfSoundMps: 343 })

describe('matchReflectionsToEtcPeaks', () => {
  it('returns the left side wall for a peak at its hand-computed delay', () => {
    // left speaker, left side wall: (sqrt(13) − sqrt(5))/343 s = 3.993 ms (geometry, facts §10)
    const [match] = matchReflectionsToEtcPeaks([{ timeMs: 4.1, levelDb: -9 }], PREDICTED, { toleranceMs: 0.3 })
    expect(match!.reflection?.surface).toBe('left side wall')
    expect(match!.reflection?.speaker).toBe('left')
    expect(match!.delayErrorMs).toBeCloseTo(4.1 - 3.993, 3)
    expect(match!.sentence).toBe('A reflection 4.1 ms after the direct sound, −9 dB, fits the left side wall (left speaker).')
  })

  it('returns no match and says so when no prediction lies within the tolerance', () => {
    const [match] = matchReflectionsToEtcPeaks([{ timeMs: 0.8, levelDb: -6 }], PREDICTED, { toleranceMs: 0.3 })
    expect(match!.reflection).toBeNull()
    expect(match!.sentence).toContain('fits no first-order reflection')
  })

  it('returns the closest prediction in delay for each peak', () => {
    const targets = PREDICTED.slice(0, 4)
    const matches = matchReflectionsToEtcPeaks(targets.map((r) => ({ timeMs: r.delayMs, levelDb: r.levelDb })), PREDICTED, { toleranceMs: 0.05 })
    matches.forEach((m, i) => expect(m.reflection?.delayMs).toBeCloseTo(targets[i]!.delayMs, 9))
  })
})
