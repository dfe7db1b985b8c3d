import { describe, expect, it } from 'vitest'
import { minimumReverberationTimeS } from '../../../../shared/acoustics/decay/bandwidthTimeProduct'
import { decayCurvaturePercent } from '../../../../shared/acoustics/decay/curvature'
import { decayWarnings } from '../../../../shared/acoustics/decay/decayWarnings'
import { uncertaintyT20, uncertaintyT30 } from '../../../../shared/acoustics/decay/reverberationUncertainty'
import { fractionalOctaveBands } from '../../../../shared/acoustics/bands/fractionalOctaveBands'
import { expectWithin } from '../../../helpers/tolerance'

describe('decayCurvaturePercent', () => {
  it('returns 10 % when T20 = 0.50 s and T30 = 0.55 s (ISO 3382-2:2008 B.3 check value)', () => {
    expectWithin(decayCurvaturePercent(0.5, 0.55), 10, 1e-9)
  })
})

describe('uncertaintyT20 / uncertaintyT30', () => {
  it('returns 0.0104 s and 0.0064 s when T = 0.5 s, 1 kHz octave, N = 6, n = 10 (ISO 3382-2:2008 Annex A)', () => {
    const inputs = { reverberationTimeS: 0.5, centreHz: 1000, bandsPerOctave: 1 as const, positionCount: 6, decaysPerPosition: 10 }
    expectWithin(uncertaintyT20(inputs), 0.0104, 0.0002)
    expectWithin(uncertaintyT30(inputs), 0.0064, 0.0002)
  })
})

describe('minimumReverberationTimeS', () => {
  it('returns 0.693 s / 0.173 s for the 100 Hz third-octave with B·T > 16 / > 4 (ISO 3382-2:2008 7.3, facts check value)', () => {
    const band = fractionalOctaveBands({ bandsPerOctave: 3, minNominalHz: 100, maxNominalHz: 100 })[0]
    expectWithin(minimumReverberationTimeS(band?.bandwidthHz as number, false), 0.693, 0.002)
    expectWithin(minimumReverberationTimeS(band?.bandwidthHz as number, true), 0.173, 0.002)
  })
})

describe('decayWarnings', () => {
  const clean: Parameters<typeof decayWarnings>[0] = {
    EDT: 0.5, T20: 0.5, T30: 0.52, fitR2: { EDT: 0.99, T20: 0.999, T30: 0.999 }, decayRangeDb: 60,
    curvaturePercent: 4, bandwidthHz: 176, isTimeReversed: false, isNoiseFloorFound: true,
  }

  it('returns no warning when every check passes', () => {
    expect(decayWarnings(clean)).toEqual([])
  })

  it('returns each ISO 3382 flag when its limit is crossed, naming the parameters', () => {
    const codes = (inputs: Partial<typeof clean>) => decayWarnings({ ...clean, ...inputs }).map((warning) => [warning.code, warning.parameters])
    expect(codes({ decayRangeDb: 40 })).toEqual([['decay-range-t30', ['T30']]])
    expect(codes({ decayRangeDb: 20 }).map(([code]) => code)).toEqual(['decay-range-edt', 'decay-range-t20', 'decay-range-t30'])
    expect(codes({ bandwidthHz: 20 })).toEqual([['bandwidth-time-product', ['EDT', 'T20', 'T30']]])
    expect(codes({ bandwidthHz: 20, isTimeReversed: true })).toEqual([])
    expect(codes({ curvaturePercent: 12 })).toEqual([['curvature', ['T20', 'T30']]])
    expect(codes({ fitR2: { EDT: 0.9, T20: 0.999, T30: 0.94 } })).toEqual([['poor-fit', ['EDT', 'T30']]])
    expect(codes({ EDT: null, T20: null, T30: null }).map(([code]) => code)).toEqual(['no-decay'])
    expect(codes({ isNoiseFloorFound: false })).toEqual([['low-snr', []]])
  })
})
