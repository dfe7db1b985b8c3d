import { describe, expect, it } from 'vitest'
import { analyseDecay } from '../../../../shared/acoustics/decay/analyseDecay'
import { expectWithin, expectWithinPercent } from '../../../helpers/tolerance'
import { closedForm, exponentialEnvelope, noiseDecay } from '../signals'

// Closed forms for a pure exponential decay: EDT = T20 = T30 = T, C50 = 10·lg(e^(0.05k) − 1),
// C80 = 10·lg(e^(0.08k) − 1), D50 = 1 − e^(−0.05k), Ts = 1/k (acoustics-facts §11, computed from
// ISO 3382-1:2009 Eqs. A.10, A.11, A.13); table values checked below.
describe('analyseDecay', () => {
  it('returns the facts §11 table values when the decay is a noise-free exponential at 48 kHz', () => {
    const table = [
      { T: 0.3, C50: 9.5424, C80: 15.8895, D50: 0.9, Ts: 0.021715 },
      { T: 0.5, C50: 4.7437, C80: 9.0956, D50: 0.74881, Ts: 0.036191 },
      { T: 1.0, C50: -0.0206, C80: 3.0534, D50: 0.49881, Ts: 0.072382 },
      { T: 2.0, C50: -3.8454, C80: -1.3206, D50: 0.29205, Ts: 0.144765 },
    ]
    for (const row of table) {
      const { parameters } = analyseDecay(exponentialEnvelope(row.T, 48000, 3 * row.T + 1), { sampleRateHz: 48000, centreHz: null, isTimeReversed: false })
      // facts check-value table: T ±0.5 %, C ±0.02 dB, D50 ±0.001, Ts ±0.05 ms
      for (const name of ['EDT', 'T20', 'T30'] as const) expectWithinPercent(parameters[name] as number, row.T, 0.5)
      expectWithin(parameters.C50 as number, row.C50, 0.02)
      expectWithin(parameters.C80 as number, row.C80, 0.02)
      expectWithin(parameters.D50 as number, row.D50, 0.001)
      expectWithin(parameters.Ts as number, row.Ts, 0.00005)
      expect(parameters.warnings).toEqual([])
    }
  })

  it('matches the closed forms when the sample rate is 44.1 or 96 kHz', () => {
    for (const sampleRateHz of [44100, 96000]) {
      const { parameters } = analyseDecay(exponentialEnvelope(0.5, sampleRateHz, 2), { sampleRateHz, centreHz: null, isTimeReversed: false })
      const expected = closedForm(0.5)
      expectWithinPercent(parameters.T30 as number, 0.5, 0.5)
      expectWithin(parameters.C50 as number, expected.C50, 0.05) // 50 ms rounds to a whole sample at 44.1 kHz
      expectWithin(parameters.D50 as number, expected.D50, 0.002)
      expectWithin(parameters.Ts as number, expected.Ts, 0.00005)
    }
  })

  it('returns T30 within 1.5 % of T when the decay is a seeded Gaussian noise carrier (facts check value)', () => {
    // facts check table: noise-carrier exponential, T = 1 s → T30 = 1.000 s ± 1.5 %
    const { parameters } = analyseDecay(noiseDecay({ reverberationTimeS: 1, sampleRateHz: 48000, durationS: 3, seed: 11 }), {
      sampleRateHz: 48000,
      centreHz: null,
      isTimeReversed: false,
    })
    expectWithinPercent(parameters.T30 as number, 1, 1.5)
    expectWithinPercent(parameters.T20 as number, 1, 2)
  })

  it('flags T30 and keeps the value when the decay range is below 45 dB', () => {
    const signal = noiseDecay({ reverberationTimeS: 0.5, sampleRateHz: 48000, durationS: 2, seed: 5, floorDb: -40 })
    const { parameters } = analyseDecay(signal, { sampleRateHz: 48000, centreHz: null, isTimeReversed: false })
    expect(parameters.decayRangeDb).toBeLessThan(45)
    expect(parameters.warnings.map((warning) => warning.code)).toContain('decay-range-t30')
    expect(parameters.T20).not.toBeNull()
  })

  it('returns a decimated curve that starts at 0 dB and never rises', () => {
    const { curve } = analyseDecay(exponentialEnvelope(0.5, 48000, 2), { sampleRateHz: 48000, centreHz: null, isTimeReversed: false, curvePointCount: 300 })
    expect(curve.levelDb.length).toBe(300)
    expect(curve.levelDb[0]).toBe(0)
    for (let i = 1; i < curve.levelDb.length; i++) expect(curve.levelDb[i] as number).toBeLessThanOrEqual(curve.levelDb[i - 1] as number)
    expect(curve.fits.T30).toHaveLength(4)
  })
})
