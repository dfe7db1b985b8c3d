// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { ApiError } from '@/api/ApiError'
import { forgetCsrfToken, onUnauthenticated, request } from '@/api/http'

function jsonResponse(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } })
}

/** A fake server: answers GET /api/auth/csrf with the next token, everything else from `answer`. */
function fakeServer(answer: (url: string, init: RequestInit) => Response) {
  const tokens = ['token-1', 'token-2', 'token-3']
  const fetchMock = vi.fn(async (url: string, init: RequestInit) => {
    if (url === '/api/auth/csrf') return jsonResponse(200, { csrfToken: tokens.shift() })
    return answer(url, init)
  })
  vi.stubGlobal('fetch', fetchMock)
  return fetchMock
}

function headerOf(init: RequestInit | undefined, name: string): string | undefined {
  return (init?.headers as Record<string, string> | undefined)?.[name]
}

describe('request', () => {
  beforeEach(() => forgetCsrfToken())
  afterEach(() => {
    vi.unstubAllGlobals()
    onUnauthenticated(null)
  })

  it('returns the parsed JSON and sends same-origin credentials when a GET succeeds', async () => {
    const fetchMock = fakeServer(() => jsonResponse(200, [{ id: 1 }]))

    const rooms = await request<{ id: number }[]>('GET', '/workspaces/1/rooms')

    expect(rooms).toEqual([{ id: 1 }])
    const [url, init] = fetchMock.mock.calls[0]!
    expect(url).toBe('/api/workspaces/1/rooms')
    expect(init.credentials).toBe('same-origin')
    expect(headerOf(init, 'x-csrf-token')).toBeUndefined()
  })

  it('throws an ApiError with status, code, message and fields when the server answers error JSON', async () => {
    const body = { error: { code: 'validation', message: 'Check the highlighted fields.', fields: { lengthM: 'Length must be more than 0 m.' } } }
    fakeServer(() => jsonResponse(400, body))

    const error = await request('POST', '/workspaces/1/rooms', { name: '' }).catch((caught: unknown) => caught)

    expect(error).toBeInstanceOf(ApiError)
    expect(error).toMatchObject({ status: 400, code: 'validation', message: 'Check the highlighted fields.', fields: { lengthM: 'Length must be more than 0 m.' } })
  })

  it('throws an ApiError with a readable message when an error response is not our JSON', async () => {
    fakeServer(() => new Response('<html>Bad gateway</html>', { status: 502 }))

    const error = (await request('GET', '/health').catch((caught: unknown) => caught)) as ApiError

    expect(error).toBeInstanceOf(ApiError)
    expect(error.status).toBe(502)
    expect(error.code).toBe('http-error')
    expect(error.message).toContain('502')
    expect(error.fields).toEqual({})
  })

  it('throws a network ApiError when fetch itself fails', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))))

    const error = (await request('GET', '/auth/me').catch((caught: unknown) => caught)) as ApiError

    expect(error).toMatchObject({ status: 0, code: 'network' })
  })

  it('attaches the CSRF token and a JSON body to a POST, fetching the token once for many calls', async () => {
    const fetchMock = fakeServer(() => jsonResponse(201, { id: 7 }))

    await Promise.all([request('POST', '/rooms/1/surveys', { name: 'Bare room' }), request('PATCH', '/rooms/1', { name: 'Booth' })])
    await request('DELETE', '/surveys/3')

    const csrfCalls = fetchMock.mock.calls.filter(([url]) => url === '/api/auth/csrf')
    expect(csrfCalls).toHaveLength(1)
    const writes = fetchMock.mock.calls.filter(([url]) => url !== '/api/auth/csrf')
    expect(writes.map(([, init]) => headerOf(init, 'x-csrf-token'))).toEqual(['token-1', 'token-1', 'token-1'])
    expect(headerOf(writes[0]![1], 'content-type')).toBe('application/json')
    expect(writes[0]![1].body).toBe(JSON.stringify({ name: 'Bare room' }))
  })

  it('refetches the token and repeats the call once when the server answers 403 csrf', async () => {
    let attempts = 0
    const fetchMock = fakeServer((_url, init) => {
      attempts += 1
      if (headerOf(init, 'x-csrf-token') === 'token-1') return jsonResponse(403, { error: { code: 'csrf', message: 'The form expired.' } })
      return jsonResponse(200, { id: 1, name: 'Booth' })
    })

    const room = await request<{ name: string }>('PATCH', '/rooms/1', { name: 'Booth' })

    expect(room.name).toBe('Booth')
    expect(attempts).toBe(2)
    expect(fetchMock.mock.calls.filter(([url]) => url === '/api/auth/csrf')).toHaveLength(2)
  })

  it('gives up after one retry when the fresh token is refused too', async () => {
    fakeServer(() => jsonResponse(403, { error: { code: 'csrf', message: 'The form expired.' } }))

    const error = (await request('DELETE', '/rooms/1').catch((caught: unknown) => caught)) as ApiError

    expect(error.code).toBe('csrf')
  })

  it('does not retry a 403 that is not about the CSRF token', async () => {
    let attempts = 0
    fakeServer(() => {
      attempts += 1
      return jsonResponse(403, { error: { code: 'forbidden', message: 'Viewers cannot change rooms.' } })
    })

    const error = (await request('DELETE', '/rooms/1').catch((caught: unknown) => caught)) as ApiError

    expect(error.message).toBe('Viewers cannot change rooms.')
    expect(attempts).toBe(1)
  })

  it('fetches a new token after forgetCsrfToken, as after sign-in', async () => {
    const fetchMock = fakeServer(() => jsonResponse(200, {}))

    await request('POST', '/auth/sign-in', { email: 'a@b.test', password: 'x' })
    forgetCsrfToken()
    await request('POST', '/auth/sign-out')

    const writes = fetchMock.mock.calls.filter(([url]) => url !== '/api/auth/csrf')
    expect(writes.map(([, init]) => headerOf(init, 'x-csrf-token'))).toEqual(['token-1', 'token-2'])
  })

  it('returns undefined for 204 No Content', async () => {
    fakeServer(() => new Response(null, { status: 204 }))

    await expect(request('DELETE', '/rooms/4')).resolves.toBeUndefined()
  })

  it('tells the unauthenticated listener when a session ends, except for the who-am-I call', async () => {
    const listener = vi.fn()
    onUnauthenticated(listener)
    fakeServer(() => jsonResponse(401, { error: { code: 'unauthenticated', message: 'Sign in first.' } }))

    await request('GET', '/auth/me').catch(() => undefined)
    expect(listener).not.toHaveBeenCalled()
    await request('GET', '/workspaces/1/rooms').catch(() => undefined)
    expect(listener).toHaveBeenCalledTimes(1)
  })
})
