// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { ApiError } from '@/api/ApiError'
import { forgetCsrfToken } from '@/api/http'
import { uploadForm } from '@/api/upload'

type Answer = { status: number; body: unknown } | 'network-error'

/** A fake XMLHttpRequest: records each request, reports progress, answers from the queue. */
class FakeXhr {
  static sent: FakeXhr[] = []
  static answers: Answer[] = []
  method = ''
  url = ''
  headers: Record<string, string> = {}
  withCredentials = false
  body: unknown = null
  status = 0
  responseText = ''
  upload: { onprogress: ((event: { lengthComputable: boolean; loaded: number; total: number }) => void) | null } = { onprogress: null }
  onload: (() => void) | null = null
  onerror: (() => void) | null = null
  onabort: (() => void) | null = null

  open(method: string, url: string): void {
    this.method = method
    this.url = url
  }
  setRequestHeader(name: string, value: string): void {
    this.headers[name.toLowerCase()] = value
  }
  abort(): void {
    this.onabort?.()
  }
  send(body: unknown): void {
    this.body = body
    FakeXhr.sent.push(this)
    const answer = FakeXhr.answers.shift() ?? { status: 500, body: null }
    queueMicrotask(() => {
      if (answer === 'network-error') return this.onerror?.()
      this.upload.onprogress?.({ lengthComputable: true, loaded: 500, total: 1000 })
      this.upload.onprogress?.({ lengthComputable: true, loaded: 1000, total: 1000 })
      this.status = answer.status
      this.responseText = answer.body === null ? '' : JSON.stringify(answer.body)
      this.onload?.()
    })
  }
}

function stubCsrf(tokens: string[]): ReturnType<typeof vi.fn> {
  const fetchMock = vi.fn(async () => new Response(JSON.stringify({ csrfToken: tokens.shift() }), { status: 200 }))
  vi.stubGlobal('fetch', fetchMock)
  return fetchMock
}

describe('uploadForm', () => {
  beforeEach(() => {
    forgetCsrfToken()
    FakeXhr.sent = []
    FakeXhr.answers = []
    vi.stubGlobal('XMLHttpRequest', FakeXhr)
  })
  afterEach(() => vi.unstubAllGlobals())

  it('returns the JSON and reports byte progress when the server accepts the upload', async () => {
    stubCsrf(['token-1'])
    FakeXhr.answers.push({ status: 202, body: { id: 5, status: 'queued' } })
    const progress: number[] = []
    const form = new FormData()
    form.append('kind', 'impulse')

    const capture = await uploadForm<{ id: number; status: string }>('/surveys/3/captures', form, { onProgress: (p) => progress.push(p.loadedBytes / p.totalBytes) })

    expect(capture).toEqual({ id: 5, status: 'queued' })
    expect(progress).toEqual([0.5, 1])
    const [xhr] = FakeXhr.sent
    expect(xhr?.method).toBe('POST')
    expect(xhr?.url).toBe('/api/surveys/3/captures')
    expect(xhr?.body).toBe(form)
  })

  it('sends the session CSRF token and credentials and leaves the multipart content type to the browser', async () => {
    stubCsrf(['token-1'])
    FakeXhr.answers.push({ status: 202, body: { id: 1 } })

    await uploadForm('/surveys/3/captures', new FormData())

    const [xhr] = FakeXhr.sent
    expect(xhr?.headers['x-csrf-token']).toBe('token-1')
    expect(xhr?.withCredentials).toBe(true)
    expect(xhr?.headers['content-type']).toBeUndefined()
  })

  it('throws an ApiError with the server message when the WAV is refused', async () => {
    stubCsrf(['token-1'])
    const message = 'This WAV uses 8-bit PCM; use 16/24/32-bit PCM or 32/64-bit float, uncompressed.'
    FakeXhr.answers.push({ status: 400, body: { error: { code: 'unsupported-encoding', message } } })

    const error = await uploadForm('/surveys/3/captures', new FormData()).catch((caught: unknown) => caught)

    expect(error).toBeInstanceOf(ApiError)
    expect(error).toMatchObject({ status: 400, code: 'unsupported-encoding', message })
  })

  it('throws a readable ApiError for a 413 without our JSON', async () => {
    stubCsrf(['token-1'])
    FakeXhr.answers.push({ status: 413, body: null })

    const error = (await uploadForm('/surveys/3/captures', new FormData()).catch((caught: unknown) => caught)) as ApiError

    expect(error).toBeInstanceOf(ApiError)
    expect(error.status).toBe(413)
    expect(error.message).toContain('413')
  })

  it('fetches a fresh CSRF token and repeats the upload once when the token went stale', async () => {
    const fetchMock = stubCsrf(['stale', 'fresh'])
    FakeXhr.answers.push({ status: 403, body: { error: { code: 'csrf', message: 'Reload the page.' } } }, { status: 202, body: { id: 9 } })

    const capture = await uploadForm<{ id: number }>('/surveys/3/captures', new FormData())

    expect(capture.id).toBe(9)
    expect(FakeXhr.sent.map((xhr) => xhr.headers['x-csrf-token'])).toEqual(['stale', 'fresh'])
    expect(fetchMock).toHaveBeenCalledTimes(2)
  })

  it('throws a network ApiError when the request cannot be sent', async () => {
    stubCsrf(['token-1'])
    FakeXhr.answers.push('network-error')

    const error = await uploadForm('/surveys/3/captures', new FormData()).catch((caught: unknown) => caught)

    expect(error).toMatchObject({ status: 0, code: 'network' })
  })
})
