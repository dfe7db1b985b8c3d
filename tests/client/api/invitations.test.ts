// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { ApiError } from '@/api/ApiError'
import { forgetCsrfToken } from '@/api/http'
import { acceptInvitation, createInvitation, getInvitationPreview, listInvitations } from '@/api/invitations'
import { fakeApi, jsonResponse } from './fakeApi'

const TOKEN = 'a1B2c3D4e5F6g7H8i9J0_-kLmN'

describe('invitations api', () => {
  beforeEach(() => forgetCsrfToken())
  afterEach(() => forgetCsrfToken())

  it('returns the invitation when createInvitation POSTs the body with the CSRF token', async () => {
    const calls = fakeApi(() => jsonResponse(201, { id: 5, email: 'client@example.test', role: 'client', roomId: 3 }))

    const invitation = await createInvitation(2, { email: 'client@example.test', role: 'client', roomId: 3 })

    expect(invitation.id).toBe(5)
    expect(calls).toEqual([{ url: '/api/workspaces/2/invitations', method: 'POST', csrf: 'csrf-1', body: { email: 'client@example.test', role: 'client', roomId: 3 } }])
  })

  it('returns pending invitations from a GET without a CSRF token', async () => {
    const calls = fakeApi(() => jsonResponse(200, []))

    expect(await listInvitations(2)).toEqual([])
    expect(calls[0]).toMatchObject({ url: '/api/workspaces/2/invitations', method: 'GET', csrf: undefined })
  })

  it('throws an ApiError with the code when the invitation was used (410)', async () => {
    fakeApi(() => jsonResponse(410, { error: { code: 'invitation-used', message: 'This invitation has been used already.' } }))

    const error = await getInvitationPreview(TOKEN).catch((caught: unknown) => caught)

    expect(error).toBeInstanceOf(ApiError)
    expect((error as ApiError).status).toBe(410)
    expect((error as ApiError).code).toBe('invitation-used')
  })

  it('returns the workspace and room when acceptInvitation POSTs to the token’s accept path', async () => {
    const calls = fakeApi(() => jsonResponse(200, { workspaceId: 2, roomId: null }))

    expect(await acceptInvitation(TOKEN)).toEqual({ workspaceId: 2, roomId: null })
    expect(calls[0]).toMatchObject({ url: `/api/invitations/${TOKEN}/accept`, method: 'POST', csrf: 'csrf-1' })
  })
})
