import { describe, expect, it } from 'vitest'
import { sweepDownloadUrl } from '@/api/testSignal'
import { DEFAULT_TEST_SIGNAL_VALUES, validateTestSignalForm } from '@/forms/testSignalForm'

describe('validateTestSignalForm', () => {
  it('returns the parameters and a download URL of the sweep endpoint when the defaults are used', () => {
    const { parameters, errors } = validateTestSignalForm(DEFAULT_TEST_SIGNAL_VALUES)

    expect(errors).toEqual({})
    expect(parameters).toEqual({ f1Hz: 20, f2Hz: 20_000, durationS: 6, sampleRateHz: 48_000, levelDb: -12 })
    expect(sweepDownloadUrl(parameters!)).toBe('/api/test-signal/sweep.wav?f1=20&f2=20000&seconds=6&rate=48000&levelDb=-12')
  })

  it('returns the server schema’s message when the end frequency is not below half the sample rate', () => {
    // Nyquist: a sampled signal holds frequencies below fs/2 only (Shannon sampling theorem).
    const { parameters, errors } = validateTestSignalForm({ ...DEFAULT_TEST_SIGNAL_VALUES, f2Hz: '24000', sampleRateHz: '44100' })

    expect(parameters).toBeNull()
    expect(errors.f2Hz).toBe('The end frequency must be below half the sample rate.')
  })

  it('returns errors for a level above −1 dBFS and a non-number duration', () => {
    const { errors } = validateTestSignalForm({ ...DEFAULT_TEST_SIGNAL_VALUES, levelDb: '0', durationS: 'long' })

    expect(errors.durationS).toBe('Type a number.')
    expect(validateTestSignalForm({ ...DEFAULT_TEST_SIGNAL_VALUES, levelDb: '0' }).errors.levelDb).toBe('Level is −60 to −1 dBFS.')
  })

  it('accepts a typed true minus sign in the level', () => {
    expect(validateTestSignalForm({ ...DEFAULT_TEST_SIGNAL_VALUES, levelDb: '−20' }).parameters?.levelDb).toBe(-20)
  })
})
