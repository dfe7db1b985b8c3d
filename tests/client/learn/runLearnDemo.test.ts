import { describe, expect, it } from 'vitest'
import { learnDemoDurationS, runLearnDemo } from '@/learn/runLearnDemo'
import { learnDemoNotes } from '@/learn/learnDemoNotes'
import { expectWithinPercent } from '../../helpers/tolerance'

describe('runLearnDemo', () => {
  it('returns T20 and T30 near the T60 set in the 1 kHz band when the noise floor is low', () => {
    const T60S = [0.8, 0.8, 0.8, 0.8, 1.2, 0.8, 0.8, 0.8]

    const result = runLearnDemo({ T60S, noiseFloorDb: -90, seed: 7 })

    const band = result.bands.find((b) => b.centreHz === 1000)!
    // An exponential decay has T20 = T30 = EDT = T60 (ISO 3382-1 definitions; Schroeder 1965).
    // ±10 %: one seed of a noise carrier in one octave band (acoustics-facts §11 gives ±1.5–5 % over
    // 40 broadband seeds; a single band scatters more — common practice, not a standard's figure).
    expectWithinPercent(band.T30 as number, 1.2, 10)
    expectWithinPercent(band.T20 as number, 1.2, 10)
  })

  it('returns the same values for the same seed (the demo is repeatable)', () => {
    const settings = { T60S: [0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5], noiseFloorDb: -70, seed: 3 }

    expect(runLearnDemo(settings).bands.map((b) => b.T30)).toEqual(runLearnDemo(settings).bands.map((b) => b.T30))
  })

  it('returns a flagged or missing T30 when the noise floor leaves less than 45 dB of decay', () => {
    // ISO 3382-1:2009 5.3.3: T30 needs the decay to start ≥ 45 dB above the background noise.
    const result = runLearnDemo({ T60S: Array(8).fill(1), noiseFloorDb: -35, seed: 1 })

    const band = result.bands.find((b) => b.centreHz === 1000)!
    const isTrusted = band.T30 !== null && band.warnings.length === 0
    expect(isTrusted).toBe(false)
  })
})

describe('learnDemoDurationS', () => {
  it('returns 1.4 × the longest T60 + 0.1 s, kept within 0.8–5 s', () => {
    expect(learnDemoDurationS([0.2, 0.3])).toBe(0.8)
    expect(learnDemoDurationS([1, 2])).toBeCloseTo(2.9, 12)
    expect(learnDemoDurationS([3])).toBeCloseTo(4.3, 12)
    expect(learnDemoDurationS([4])).toBe(5)
  })
})

describe('learnDemoNotes', () => {
  it('returns notes naming each band’s T60, the noise floor and the seed', () => {
    const notes = learnDemoNotes({ T60S: [1, 0.9, 0.8, 0.7, 0.6, 0.5, 0.4, 0.3], noiseFloorDb: -70, seed: 42 })

    expect(notes).toContain('63 Hz: 1.00 s')
    expect(notes).toContain('8 kHz: 0.30 s')
    expect(notes).toContain('Noise floor -70 dB')
    expect(notes).toContain('seed 42')
    expect(notes).toContain('synthetic room, not a measurement')
  })
})
