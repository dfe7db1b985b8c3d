import { describe, expect, it } from 'vitest'
import { findImpulseOnset } from '../../../shared/acoustics/onset'
import { trimImpulse } from '../../../shared/acoustics/trimImpulse'

describe('findImpulseOnset', () => {
  it('returns n0 when silence is followed by a response that first reaches −20 dB re peak at n0 (ISO 3382-1:2009 Annex A)', () => {
    const impulse = new Float64Array(1000)
    impulse[300] = 0.05 // −26 dB re peak: below the threshold
    impulse[400] = 0.1001 // −19.99 dB: the onset
    impulse[405] = -1 // peak
    impulse[410] = 0.5
    expect(findImpulseOnset(impulse)).toEqual({ onsetSample: 400, peakSample: 405 })
  })

  it('never searches after the peak', () => {
    const impulse = new Float64Array([0, 0, 1, 0.5, 0.9])
    expect(findImpulseOnset(impulse).onsetSample).toBe(2)
  })
})

describe('trimImpulse', () => {
  it('returns a copy from onset − pre-roll, at most maxDurationS long', () => {
    const impulse = new Float64Array(100).map((_, i) => i)
    const trimmed = trimImpulse(impulse, { sampleRateHz: 10, startSample: 20, preRollSamples: 5, maxDurationS: 3 })
    expect(Array.from(trimmed)).toEqual(Array.from({ length: 30 }, (_, i) => i + 15))
    trimmed[0] = -1
    expect(impulse[15]).toBe(15)
  })
})
