import { describe, expect, it } from 'vitest'
import { linearFit } from '../../../../shared/acoustics/linearFit'
import { synthesizeRoomImpulse } from '../../../../shared/acoustics/synthetic/synthesizeRoomImpulse'
import { expectWithin, expectWithinPercent } from '../../../helpers/tolerance'
import { bandLimit } from '../sweep/bandLimit'

const fs = 48000

/**
 * T60 from the slope of the log energy in 10 ms blocks, fitted from `fromDb` to `toDb` below the
 * first block (−60/slope): for e^(−kt) energy the level falls 60 dB in T60 (acoustics-facts §11).
 */
function fittedT60(signal: Float64Array, startSample: number, fromDb: number, toDb: number): number {
  const block = Math.round(0.01 * fs)
  const times: number[] = []
  const levels: number[] = []
  let firstDb: number | null = null
  for (let start = startSample; start + block <= signal.length; start += block) {
    let energy = 0
    for (let i = start; i < start + block; i++) energy += (signal[i] as number) ** 2
    const levelDb = 10 * Math.log10(energy)
    firstDb ??= levelDb
    const relativeDb = levelDb - firstDb
    if (relativeDb < toDb) break
    if (relativeDb <= fromDb) {
      times.push((start - startSample + block / 2) / fs)
      levels.push(levelDb)
    }
  }
  return -60 / linearFit(times, levels).slope
}

describe('synthesizeRoomImpulse', () => {
  const base = { sampleRateHz: fs, durationS: 1.5, noiseFloorDb: -120, seed: 11, bandDecays: [{ centreHz: 1000, T60S: 0.5 }] }

  it('returns the same samples for the same seed and different ones for another seed', () => {
    const a = synthesizeRoomImpulse(base)
    expect(Array.from(synthesizeRoomImpulse(base))).toEqual(Array.from(a))
    expect(Array.from(synthesizeRoomImpulse({ ...base, seed: 12 }).subarray(100, 200))).not.toEqual(Array.from(a.subarray(100, 200)))
  })

  it.each([0.3, 0.5, 1.2])('returns a broadband decay with the requested T60 = %s s when one band is given', (T60S) => {
    const response = synthesizeRoomImpulse({ ...base, durationS: 2 * T60S, bandDecays: [{ centreHz: 1000, T60S }], hasDirectSound: false })
    expectWithinPercent(fittedT60(response, 0, -3, -40), T60S, 3)
  })

  it('returns each band decaying at its own T60 when the bands differ', () => {
    const response = synthesizeRoomImpulse({
      ...base,
      durationS: 2,
      hasDirectSound: false,
      bandDecays: [
        { centreHz: 250, T60S: 0.9 },
        { centreHz: 2000, T60S: 0.3 },
      ],
    })
    // Keep frequencies well inside each band's share (their boundary is at √(250·2000) ≈ 707 Hz).
    const low = bandLimit(response, { sampleRateHz: fs, lowHz: 100, highHz: 500 })
    const high = bandLimit(response, { sampleRateHz: fs, lowHz: 1200, highHz: 8000 })
    expectWithinPercent(fittedT60(low, 0, -3, -40), 0.9, 5)
    expectWithinPercent(fittedT60(high, 0, -3, -40), 0.3, 5)
  })

  it('returns a unit peak at the direct sound, the reflections at their delays and levels, and the noise floor', () => {
    const response = synthesizeRoomImpulse({
      ...base,
      durationS: 3,
      noiseFloorDb: -70,
      directDelayMs: 5,
      reverberantLevelDb: -50,
      reflections: [{ delayMs: 3, gainDb: -6 }],
    })
    const direct = Math.round(0.005 * fs)
    let peak = 0
    for (let i = 1; i < response.length; i++) if ((response[i] as number) > (response[peak] as number)) peak = i
    expect(peak).toBe(direct)
    expectWithin(response[direct] as number, 1, 0.01)
    expectWithin(response[direct + Math.round(0.003 * fs)] as number, Math.pow(10, -6 / 20), 0.01)
    // After 2.5 s the 0.5 s decay is 300 dB down: only the background noise remains.
    const tail = response.subarray(Math.round(2.5 * fs))
    const tailPowerDb = 10 * Math.log10(tail.reduce((sum, v) => sum + v * v, 0) / tail.length)
    expectWithin(tailPowerDb, -70, 0.2)
    expect(response.subarray(0, direct).every((v) => Math.abs(v) < 0.002)).toBe(true)
  })

  it.each([
    { name: 'no bands', change: { bandDecays: [] }, message: /at least one band/ },
    { name: 'a zero T60', change: { bandDecays: [{ centreHz: 500, T60S: 0 }] }, message: /T60 must be positive/ },
    { name: 'falling band centres', change: { bandDecays: [{ centreHz: 500, T60S: 1 }, { centreHz: 250, T60S: 1 }] }, message: /rise/ },
    { name: 'a noise floor above the peak', change: { noiseFloorDb: 3 }, message: /noise floor/ },
    { name: 'a direct delay past the end', change: { directDelayMs: 5000 }, message: /direct delay/ },
  ])('throws a DspInputError when given $name', ({ change, message }) => {
    expect(() => synthesizeRoomImpulse({ ...base, ...change })).toThrow(message)
  })
})
