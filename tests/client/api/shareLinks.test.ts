// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { ApiError } from '@/api/ApiError'
import { forgetCsrfToken } from '@/api/http'
import { createShareLink, getSharedComparison, listShareLinks, revokeShareLink, sharedReportPdfUrl } from '@/api/shareLinks'
import { fakeApi, jsonResponse } from './fakeApi'

const TOKEN = 'a1B2c3D4e5F6g7H8i9J0_-kLmN'

describe('shareLinks api', () => {
  beforeEach(() => forgetCsrfToken())
  afterEach(() => forgetCsrfToken())

  it('returns the link with its one-time URL when createShareLink POSTs the choice', async () => {
    const calls = fakeApi(() => jsonResponse(201, { id: 1, url: `http://127.0.0.1:3000/shared/${TOKEN}` }))
    const body = { surveyIds: [4, 9], bands: 'octave' as const, label: 'For the client', expiresInDays: 30 }

    const link = await createShareLink(3, body)

    expect(link.url).toBe(`http://127.0.0.1:3000/shared/${TOKEN}`)
    expect(calls[0]).toEqual({ url: '/api/rooms/3/share-links', method: 'POST', csrf: 'csrf-1', body })
  })

  it('returns undefined when revokeShareLink DELETEs and the server answers 204', async () => {
    const calls = fakeApi(() => jsonResponse(204, null))

    expect(await revokeShareLink(3, 8)).toBeUndefined()
    expect(calls[0]).toMatchObject({ url: '/api/rooms/3/share-links/8', method: 'DELETE', csrf: 'csrf-1' })
  })

  it('returns the room’s links from a GET', async () => {
    const calls = fakeApi(() => jsonResponse(200, [{ id: 1 }]))

    expect(await listShareLinks(3)).toEqual([{ id: 1 }])
    expect(calls[0]).toMatchObject({ url: '/api/rooms/3/share-links', method: 'GET' })
  })

  it('throws an ApiError 410 share-revoked when the shared comparison was withdrawn', async () => {
    fakeApi(() => jsonResponse(410, { error: { code: 'share-revoked', message: 'This link has been withdrawn by its owner.' } }))

    const error = (await getSharedComparison(TOKEN).catch((caught: unknown) => caught)) as ApiError

    expect(error.status).toBe(410)
    expect(error.code).toBe('share-revoked')
  })

  it('returns the public PDF path of a token', () => {
    expect(sharedReportPdfUrl(TOKEN)).toBe(`/api/shared/${TOKEN}/report.pdf`)
  })
})
