// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import type { RouteLocationNormalized } from 'vue-router'
import { forgetCsrfToken } from '@/api/http'
import { authGuard, safeRedirect } from '@/router/authGuard'

const me = { user: { id: 1, name: 'Demo Owner', email: 'owner@ringdown.test' }, memberships: [{ workspaceId: 1, workspaceName: 'Demo', role: 'client' }] }

function route(fullPath: string, meta: RouteLocationNormalized['meta'] = {}, query: Record<string, string> = {}): RouteLocationNormalized {
  return { fullPath, path: fullPath, meta, query } as unknown as RouteLocationNormalized
}

function serverSays(status: number, body: unknown): void {
  vi.stubGlobal('fetch', vi.fn(async () => new Response(JSON.stringify(body), { status })))
}

describe('authGuard', () => {
  beforeEach(() => {
    setActivePinia(createPinia())
    forgetCsrfToken()
  })
  afterEach(() => vi.unstubAllGlobals())

  it('returns the sign-in page with a redirect back when a signed-out visitor opens a member page', async () => {
    serverSays(401, { error: { code: 'unauthenticated', message: 'Sign in first.' } })

    await expect(authGuard(route('/rooms/4?tab=x'))).resolves.toEqual({ name: 'sign-in', query: { redirect: '/rooms/4?tab=x' } })
  })

  it('returns the rooms list when a signed-in user opens the sign-in page', async () => {
    serverSays(200, me)

    await expect(authGuard(route('/sign-in', { access: 'guest' }))).resolves.toBe('/rooms')
  })

  it('returns the redirect target when a signed-in user arrives at sign-in with one', async () => {
    serverSays(200, me)

    await expect(authGuard(route('/sign-in', { access: 'guest' }, { redirect: '/rooms/7' }))).resolves.toBe('/rooms/7')
  })

  it('returns the rooms list when the role may not open the page', async () => {
    serverSays(200, me)

    await expect(authGuard(route('/workspace/members', { roles: ['owner', 'engineer'] }))).resolves.toEqual({ name: 'rooms' })
  })

  it('returns true for pages open to everyone, signed in or not', async () => {
    serverSays(401, { error: { code: 'unauthenticated', message: 'Sign in first.' } })

    await expect(authGuard(route('/nowhere', { access: 'any' }))).resolves.toBe(true)
  })
})

describe('safeRedirect', () => {
  it('returns /rooms for targets outside the app', () => {
    expect(safeRedirect('//elsewhere.example/x')).toBe('/rooms')
    expect(safeRedirect('https://elsewhere.example')).toBe('/rooms')
    expect(safeRedirect(undefined)).toBe('/rooms')
    expect(safeRedirect('/rooms/3/edit')).toBe('/rooms/3/edit')
  })
})
