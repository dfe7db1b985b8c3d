import { vi } from 'vitest'

export function jsonResponse(status: number, body: unknown): Response {
  return status === 204 ? new Response(null, { status }) : new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } })
}

/** A fake server: GET /api/auth/csrf gives "csrf-1"; every other call is recorded and answered by `answer`. */
export function fakeApi(answer: (url: string, init: RequestInit) => Response) {
  const calls: { url: string; method: string; csrf: string | undefined; body: unknown }[] = []
  vi.stubGlobal('fetch', vi.fn(async (url: string, init: RequestInit) => {
    if (url === '/api/auth/csrf') return jsonResponse(200, { csrfToken: 'csrf-1' })
    const headers = (init.headers ?? {}) as Record<string, string>
    calls.push({ url, method: init.method ?? 'GET', csrf: headers['x-csrf-token'], body: init.body ? JSON.parse(String(init.body)) : undefined })
    return answer(url, init)
  }))
  return calls
}
