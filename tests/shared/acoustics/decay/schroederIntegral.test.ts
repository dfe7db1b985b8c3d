import { describe, expect, it } from 'vitest'
import { fitDecayRange } from '../../../../shared/acoustics/decay/fitDecayRange'
import { schroederCurveDb, schroederIntegral, suffixEnergySums } from '../../../../shared/acoustics/decay/schroederIntegral'
import { toEnergy } from '../../../../shared/acoustics/decay/toEnergy'
import { expectWithin } from '../../../helpers/tolerance'
import { exponentialEnvelope } from '../signals'

const fs = 48000

/** T from a curve integrated only up to the sample where the decay reaches `truncationDb`, C = 0. */
function truncatedFit(truncationDb: number, startDb: number, endDb: number): number {
  const energy = toEnergy(exponentialEnvelope(1, fs, 2))
  const endSample = Math.round(((-truncationDb / 60) * 1) * fs)
  const suffix = suffixEnergySums(energy)
  const fit = fitDecayRange({ suffixEnergy: suffix, endSample, tailEnergy: 0 }, { sampleRateHz: fs, startDb, endDb })
  return fit?.reverberationTimeS as number
}

describe('schroederIntegral', () => {
  it('returns the same exponential when the energy is exponential (Schroeder 1965, facts §11)', () => {
    const levels = schroederCurveDb(schroederIntegral(toEnergy(exponentialEnvelope(0.5, fs, 5))))
    // L(t) = −60·t/T: 0.25 s → −30 dB
    expectWithin(levels[Math.round(0.25 * fs)] as number, -30, 0.01)
  })

  it('is non-increasing and leaves its input untouched', () => {
    const energy = toEnergy(exponentialEnvelope(0.3, fs, 1))
    const copy = energy.slice()
    const integral = schroederIntegral(energy, { endSample: 30000, tailEnergy: 2 })
    expect(integral.length).toBe(30000)
    for (let i = 1; i < integral.length; i++) expect(integral[i] as number).toBeLessThanOrEqual(integral[i - 1] as number)
    expect(integral[29999]).toBeCloseTo(2 + (energy[29999] as number), 12)
    expect(energy).toEqual(copy)
  })

  it('returns T30 = 0.9915·T when integrated to the −45 dB point with C = 0 (ISO 3382-1 5.3.3 rule, facts §1.5 check value)', () => {
    expectWithin(truncatedFit(-45, -5, -35), 0.9915, 0.002)
  })

  it('returns T20 = 0.9844·T when integrated to the −35 dB point with C = 0 (facts §1.5 check value)', () => {
    expectWithin(truncatedFit(-35, -5, -25), 0.9844, 0.002)
  })
})
