import { describe, expect, it } from 'vitest'
import { OCTAVE_RATIO as G } from '../../../../shared/acoustics/bands/fractionalOctaveBands'
import { iec61260AcceptanceLimits } from '../../../../shared/acoustics/bands/iec61260AcceptanceLimits'
import { expectWithin } from '../../../helpers/tolerance'

// IEC 61260-1:2014 Table 1 (octave breakpoints) and Formula (9) for fractional bands, facts §3.
describe('iec61260AcceptanceLimits', () => {
  it('returns the class-1 Table 1 values at the octave breakpoints, mirrored below f_m', () => {
    const at = (omega: number) => iec61260AcceptanceLimits(omega, { bandsPerOctave: 1, filterClass: 1 })
    expect(at(1)).toEqual({ minDb: -0.4, maxDb: 0.4 })
    expectWithin(at(G ** (1 / 4)).maxDb, 0.7, 1e-9)
    expectWithin(at(1 / G ** (3 / 8)).maxDb, 1.4, 1e-9)
    expectWithin(at(G ** 0.5).maxDb, 5.3, 1e-9)
    expectWithin(at(G ** 0.5 * 1.0001).minDb, 1.2, 0.01)
    expectWithin(at(G).minDb, 16.6, 1e-9)
    expectWithin(at(1 / G ** 2).minDb, 40.5, 1e-9)
    expectWithin(at(G ** 3).minDb, 60, 1e-9)
    expectWithin(at(G ** 5).minDb, 70, 1e-9)
  })

  it('returns the class-2 values when asked', () => {
    expectWithin(iec61260AcceptanceLimits(G, { bandsPerOctave: 1, filterClass: 2 }).minDb, 15.6, 1e-9)
    expectWithin(iec61260AcceptanceLimits(1, { bandsPerOctave: 1, filterClass: 2 }).maxDb, 0.6, 1e-9)
  })

  it('maps the breakpoints with Formula 9 for third-octaves (G edge → G^(1/6))', () => {
    const edge = G ** (1 / 6)
    expectWithin(iec61260AcceptanceLimits(edge, { bandsPerOctave: 3, filterClass: 1 }).maxDb, 5.3, 1e-9)
    const omegaG = 1 + ((G ** (1 / 6) - 1) / (G ** 0.5 - 1)) * (G - 1)
    expectWithin(iec61260AcceptanceLimits(omegaG, { bandsPerOctave: 3, filterClass: 1 }).minDb, 16.6, 1e-9)
  })
})
