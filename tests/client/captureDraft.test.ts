// @vitest-environment jsdom
import { describe, expect, it } from 'vitest'
import { captureFormData, defaultCaptureDraftFields, isWavFile, validateCaptureDraft } from '@/forms/captureDraft'

describe('defaultCaptureDraftFields', () => {
  it('returns receiver "Position n", an impulse, channel 0 and a 1.2 m receiver height for the n-th file', () => {
    // 1.2 m: ISO 3382-1:2009 cl. 5.2 receiver height for seated audiences.
    expect(defaultCaptureDraftFields('room-a.wav', 3)).toMatchObject({ kind: 'impulse', channel: '0', receiverLabel: 'Position 3', positionZM: '1.2' })
  })

  it('returns a sweep with the test sweep’s parameters when the file name says sweep', () => {
    expect(defaultCaptureDraftFields('Sweep take 2.wav', 1)).toMatchObject({ kind: 'sweep', sweepF1Hz: '20', sweepF2Hz: '20000', sweepDurationS: '6' })
  })

  it('carries the source, channel and height over from the previous file', () => {
    const previous = { ...defaultCaptureDraftFields('a.wav', 1), sourceLabel: 'Left speaker', channel: '1', positionZM: '1.1' }
    expect(defaultCaptureDraftFields('b.wav', 2, previous)).toMatchObject({ sourceLabel: 'Left speaker', channel: '1', positionZM: '1.1', receiverLabel: 'Position 2' })
  })
})

describe('validateCaptureDraft', () => {
  it('returns the parsed body when an impulse draft is complete, dropping sweep fields', () => {
    const { body, errors } = validateCaptureDraft({ ...defaultCaptureDraftFields('a.wav', 1), positionXM: '2,5' }, false)

    expect(errors).toEqual({})
    expect(body).toMatchObject({ kind: 'impulse', channel: 0, receiverLabel: 'Position 1', positionXM: 2.5, positionZM: 1.2, sweepF1Hz: null })
  })

  it('returns errors for missing sweep parameters when no reference sweep goes with it', () => {
    const fields = { ...defaultCaptureDraftFields('sweep.wav', 1), sweepF1Hz: '', sweepDurationS: '' }

    const { body, errors } = validateCaptureDraft(fields, false)

    expect(body).toBeNull()
    expect(errors.sweepF1Hz).toContain('reference sweep')
    expect(errors.sweepDurationS).toContain('reference sweep')
  })

  it('accepts a sweep without parameters when a reference sweep file is given', () => {
    const fields = { ...defaultCaptureDraftFields('sweep.wav', 1), sweepF1Hz: '', sweepF2Hz: '', sweepDurationS: '' }
    expect(validateCaptureDraft(fields, true).body).not.toBeNull()
  })

  it('returns the schema’s message when the sweep ends below its start', () => {
    const { errors } = validateCaptureDraft({ ...defaultCaptureDraftFields('sweep.wav', 1), sweepF1Hz: '2000', sweepF2Hz: '100' }, false)
    expect(errors.sweepF2Hz).toBe('The sweep must end above its start frequency.')
  })

  it('returns a number error when a position is not a number', () => {
    expect(validateCaptureDraft({ ...defaultCaptureDraftFields('a.wav', 1), positionYM: 'two' }, false).errors.positionYM).toBe('Type a number, e.g. 1.5.')
  })
})

describe('captureFormData', () => {
  it('returns the fields as strings with blanks left out and the file last', () => {
    const { body } = validateCaptureDraft(defaultCaptureDraftFields('a.wav', 1), false)
    const file = new File(['RIFF'], 'a.wav', { type: 'audio/wav' })

    const form = captureFormData(body!, file, null)

    expect(form.get('kind')).toBe('impulse')
    expect(form.get('positionZM')).toBe('1.2')
    expect(form.has('positionXM')).toBe(false)
    expect(form.has('reference')).toBe(false)
    expect([...form.keys()].at(-1)).toBe('file')
  })
})

describe('isWavFile', () => {
  it('returns true for .wav names or WAV types and false otherwise', () => {
    expect(isWavFile({ name: 'A.WAV', type: '' })).toBe(true)
    expect(isWavFile({ name: 'take', type: 'audio/x-wav' })).toBe(true)
    expect(isWavFile({ name: 'take.mp3', type: 'audio/mpeg' })).toBe(false)
  })
})
