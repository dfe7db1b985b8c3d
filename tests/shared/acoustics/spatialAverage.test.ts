import { describe, expect, it } from 'vitest'
import { spatialAverage } from '../../../shared/acoustics/spatialAverage'
import type { BandResult } from '../../../shared/types/analysis'
import { expectWithin } from '../../helpers/tolerance'

function band(centreHz: number, T20: number | null, C80: number): BandResult {
  return {
    centreHz, exactCentreHz: centreHz, T20, T30: T20, EDT: T20, C50: C80 - 3, C80, D50: 0.5, Ts: 0.05, decayRangeDb: 60, peakToNoiseDb: 70,
    curvaturePercent: 0, uncertaintyT20: null, uncertaintyT30: null, fitR2: { T20: 1, T30: 1, EDT: 1 }, warnings: [],
  }
}

describe('spatialAverage', () => {
  it('returns mean, sample standard deviation, min, max and count per band, leaving out nulls', () => {
    const result = spatialAverage([[band(500, 0.4, 2), band(1000, 0.5, 3)], [band(500, 0.6, 4), band(1000, null, 5)], [band(500, 0.5, 6)]])
    expect(result.map((entry) => entry.centreHz)).toEqual([500, 1000])
    const t20 = result[0]?.parameters.T20
    expectWithin(t20?.mean as number, 0.5, 1e-12)
    expectWithin(t20?.standardDeviation as number, 0.1, 1e-12) // sample SD of 0.4, 0.5, 0.6
    expect([t20?.min, t20?.max, t20?.count]).toEqual([0.4, 0.6, 3])
    expect(result[1]?.parameters.T20).toEqual({ mean: 0.5, standardDeviation: null, min: 0.5, max: 0.5, count: 1 })
    expect(result[1]?.parameters.C80.count).toBe(2)
  })

  it('returns the ISO 3382-2 Annex A uncertainty of the mean with N = positions when the band type is given', () => {
    const positions = Array.from({ length: 6 }, () => [band(1000, 0.5, 0)])
    const [entry] = spatialAverage(positions, { bandsPerOctave: 1 })
    expectWithin(entry?.uncertaintyT20 as number, 0.0104, 0.0002) // facts §1.8 check value (N = 6, n = 10)
    expectWithin(entry?.uncertaintyT30 as number, 0.0064, 0.0002)
  })
})
