// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { listRoomActivity } from '@/api/activity'
import { listDevMailbox } from '@/api/devMailbox'
import { forgetCsrfToken } from '@/api/http'
import { requestPasswordReset, resetPassword } from '@/api/passwordReset'
import { roomReportPdfUrl, sendReport } from '@/api/reports'
import { fakeApi, jsonResponse } from './fakeApi'

describe('reports api', () => {
  beforeEach(() => forgetCsrfToken())
  afterEach(() => forgetCsrfToken())

  it('returns the PDF path with the surveys in order and the band resolution', () => {
    expect(roomReportPdfUrl(3, [4, 9], 'third')).toBe('/api/rooms/3/report.pdf?surveys=4%2C9&bands=third')
  })

  it('returns the link when sendReport POSTs the recipient and the choice', async () => {
    const calls = fakeApi(() => jsonResponse(201, { id: 2 }))
    const body = { surveyIds: [4, 9], bands: 'octave' as const, recipientEmail: 'client@example.test', expiresInDays: 90 }

    expect(await sendReport(3, body)).toEqual({ id: 2 })
    expect(calls[0]).toEqual({ url: '/api/rooms/3/reports', method: 'POST', csrf: 'csrf-1', body })
  })
})

describe('passwordReset api', () => {
  beforeEach(() => forgetCsrfToken())

  it('POSTs the address, then the new password to the token’s path', async () => {
    const calls = fakeApi((url) => (url.endsWith('/password-reset') ? jsonResponse(202, { message: 'sent' }) : jsonResponse(204, null)))

    await requestPasswordReset('a@example.test')
    await resetPassword('a1B2c3D4e5F6g7H8i9J0', 'long enough password')

    expect(calls.map((c) => [c.method, c.url, c.body])).toEqual([
      ['POST', '/api/auth/password-reset', { email: 'a@example.test' }],
      ['POST', '/api/auth/password-reset/a1B2c3D4e5F6g7H8i9J0', { password: 'long enough password' }],
    ])
  })
})

describe('activity and dev mailbox api', () => {
  it('GETs the room trail and the fake inbox', async () => {
    const calls = fakeApi(() => jsonResponse(200, []))

    await listRoomActivity(3)
    await listDevMailbox()

    expect(calls.map((c) => [c.method, c.url])).toEqual([['GET', '/api/rooms/3/activity'], ['GET', '/api/dev/mailbox']])
  })
})
