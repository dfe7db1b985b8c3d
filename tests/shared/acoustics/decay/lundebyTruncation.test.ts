import { describe, expect, it } from 'vitest'
import { analyseDecay } from '../../../../shared/acoustics/decay/analyseDecay'
import { fitDecayRange } from '../../../../shared/acoustics/decay/fitDecayRange'
import { lundebyTruncation } from '../../../../shared/acoustics/decay/lundebyTruncation'
import { suffixEnergySums } from '../../../../shared/acoustics/decay/schroederIntegral'
import { toEnergy } from '../../../../shared/acoustics/decay/toEnergy'
import { expectWithin, expectWithinPercent } from '../../../helpers/tolerance'
import { noiseDecay } from '../signals'

const fs = 48000

// Lundeby, Vigran, Bietz & Vorländer, Acustica 81 (1995) 344–355 (facts §2.1): truncating at the
// crosspoint and adding C = P̄·T/(6 ln 10) removes most of the noise bias of plain integration.
describe('lundebyTruncation', () => {
  const T = 0.8
  const floorDb = -50
  const signal = noiseDecay({ reverberationTimeS: T, sampleRateHz: fs, durationS: 4, seed: 21, floorDb })
  const energy = toEnergy(signal)
  const suffix = suffixEnergySums(energy)

  it('puts the crosspoint where the decay meets the known noise floor', () => {
    const result = lundebyTruncation(energy, suffix, { sampleRateHz: fs, initialWindowS: 0.03 })
    // The envelope reaches −50 dB (the floor's power) at t = 50/60·T = 0.667 s.
    expectWithin(result.truncationSample / fs, (-floorDb / 60) * T, 0.08)
    expectWithinPercent(10 * Math.log10(result.noisePower), floorDb, 2)
    expect(result.isReliable).toBe(true)
  })

  it('lowers the T30 bias when a noise floor is present, compared with plain integration', () => {
    const plain = fitDecayRange({ suffixEnergy: suffix, endSample: energy.length, tailEnergy: 0 }, { sampleRateHz: fs, startDb: -5, endDb: -35 })
    const compensated = analyseDecay(signal, { sampleRateHz: fs, centreHz: null, isTimeReversed: false }).parameters.T30 as number
    const plainError = Math.abs((plain?.reverberationTimeS as number) - T)
    expect(Math.abs(compensated - T)).toBeLessThan(plainError / 3)
    expectWithinPercent(compensated, T, 5)
  })

  it('gives up (unreliable, no truncation) when the peak is less than 20 dB above the noise', () => {
    const noisy = noiseDecay({ reverberationTimeS: T, sampleRateHz: fs, durationS: 2, seed: 3, floorDb: -12 })
    const e = toEnergy(noisy)
    const result = lundebyTruncation(e, suffixEnergySums(e), { sampleRateHz: fs, initialWindowS: 0.03 })
    expect(result.isReliable).toBe(false)
    expect(result.truncationSample).toBe(e.length)
  })
})
