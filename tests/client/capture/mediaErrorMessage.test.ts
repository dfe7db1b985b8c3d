import { describe, expect, it } from 'vitest'
import { canRecordInBrowser, mediaErrorMessage } from '@/capture/mediaErrorMessage'

function domError(name: string): Error {
  const error = new Error('browser text')
  error.name = name
  return error
}

describe('mediaErrorMessage', () => {
  it('returns the permission advice when the browser refused the microphone', () => {
    expect(mediaErrorMessage(domError('NotAllowedError'))).toMatch(/not allowed to use the microphone/)
  })

  it('returns the no-device advice when no input exists or the chosen one is gone', () => {
    expect(mediaErrorMessage(domError('NotFoundError'))).toMatch(/No microphone was found/)
    expect(mediaErrorMessage(domError('OverconstrainedError'))).toMatch(/No microphone was found/)
  })

  it('returns the busy-device advice when the input cannot be read', () => {
    expect(mediaErrorMessage(domError('NotReadableError'))).toMatch(/in use by another program/)
  })

  it('returns the error’s own message when the name is not a media error', () => {
    expect(mediaErrorMessage(new Error('The test sweep could not be fetched (HTTP 400).'))).toBe('The test sweep could not be fetched (HTTP 400).')
  })
})

describe('canRecordInBrowser', () => {
  it('returns true only on a secure page with media devices', () => {
    expect(canRecordInBrowser({ isSecureContext: true, navigator: { mediaDevices: {} } })).toBe(true)
    expect(canRecordInBrowser({ isSecureContext: false, navigator: { mediaDevices: {} } })).toBe(false)
    expect(canRecordInBrowser({ isSecureContext: true, navigator: {} })).toBe(false)
  })
})
