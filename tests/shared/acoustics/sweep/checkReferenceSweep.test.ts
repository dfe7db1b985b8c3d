import { describe, expect, it } from 'vitest'
import { checkReferenceSweep } from '../../../../shared/acoustics/sweep/checkReferenceSweep'
import { DspInputError } from '../../../../shared/acoustics/errors'

function codeOf(run: () => void): string | null {
  try {
    run()
    return null
  } catch (error) {
    return error instanceof DspInputError ? error.code : 'other'
  }
}

// ISO 18233:2006 Annex B deconvolves the recording by the played signal bin by bin, which only
// means something when both have one sample rate and the recording holds the whole sweep.
describe('checkReferenceSweep', () => {
  it('accepts a reference at the recording rate that fits inside the recording', () => {
    expect(codeOf(() => checkReferenceSweep({ sampleRateHz: 48_000, frameCount: 96_000 }, { sampleRateHz: 48_000, frameCount: 96_000 }))).toBeNull()
    expect(codeOf(() => checkReferenceSweep({ sampleRateHz: 48_000, frameCount: 200_000 }, { sampleRateHz: 48_000, frameCount: 96_000 }))).toBeNull()
  })

  it('refuses a reference at another sample rate, naming both rates', () => {
    const run = () => checkReferenceSweep({ sampleRateHz: 48_000, frameCount: 96_000 }, { sampleRateHz: 44_100, frameCount: 44_100 })
    expect(codeOf(run)).toBe('reference-rate-mismatch')
    expect(run).toThrow(/44100 Hz but the recording at 48000 Hz/)
  })

  it('refuses a recording shorter than the reference, in seconds', () => {
    const run = () => checkReferenceSweep({ sampleRateHz: 48_000, frameCount: 48_000 }, { sampleRateHz: 48_000, frameCount: 144_000 })
    expect(codeOf(run)).toBe('recording-shorter-than-reference')
    expect(run).toThrow(/\(1\.00 s\) is shorter than the reference sweep \(3\.00 s\)/)
  })
})
