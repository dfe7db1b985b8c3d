// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { effectScope, ref } from 'vue'
import type { CapturePageDto } from '@shared/api'
import type { CaptureStatus } from '@shared/jobs/analysisJob'
import type { CaptureListItem, CapturePageQuery } from '@/api/captures'
import { FakeEventSource } from './fakeEventSource'

const listCaptures = vi.fn<(surveyId: number, query: CapturePageQuery) => Promise<CapturePageDto>>()
vi.mock('@/api/captures', () => ({ listCaptures: (surveyId: number, query: CapturePageQuery) => listCaptures(surveyId, query) }))
const { useCaptureStatusPolling } = await import('@/composables/useCaptureStatusPolling')

function capture(id: number, status: CaptureStatus): CaptureListItem {
  return { id, surveyId: 7, status, statusMessage: null } as CaptureListItem
}

function pageOf(items: CaptureListItem[], total = items.length): CapturePageDto {
  return { items, total, page: 1, pageSize: 50 }
}

function setVisibility(state: 'visible' | 'hidden'): void {
  Object.defineProperty(document, 'visibilityState', { configurable: true, get: () => state })
  document.dispatchEvent(new Event('visibilitychange'))
}

/** Without a stream (no EventSource here), the list falls back to polling. */
function startPolling() {
  const scope = effectScope()
  return { scope, polling: scope.run(() => useCaptureStatusPolling(ref(7)))! }
}

function startStreaming() {
  const scope = effectScope()
  const polling = scope.run(() => useCaptureStatusPolling(ref(7), { events: { createSource: FakeEventSource.create, reopenDelayMs: () => 5000 } }))!
  return { scope, polling, stream: () => FakeEventSource.instances[FakeEventSource.instances.length - 1]! }
}

describe('useCaptureStatusPolling without a stream', () => {
  beforeEach(() => {
    vi.useFakeTimers()
    listCaptures.mockReset()
    FakeEventSource.reset()
    setVisibility('visible')
  })
  afterEach(() => vi.useRealTimers())

  it('returns live statuses and stops polling when every capture is done or failed', async () => {
    const answers = [[capture(1, 'queued')], [capture(1, 'analysing')], [capture(1, 'done')]]
    listCaptures.mockImplementation(async () => pageOf(answers.shift() ?? [capture(1, 'done')]))
    const { scope, polling } = startPolling()

    await polling.load()
    expect(polling.captures.value[0]?.status).toBe('queued')
    await vi.advanceTimersByTimeAsync(1000)
    expect(polling.captures.value[0]?.status).toBe('analysing')
    await vi.advanceTimersByTimeAsync(2000)
    expect(polling.captures.value[0]?.status).toBe('done')
    await vi.advanceTimersByTimeAsync(60_000)

    expect(listCaptures).toHaveBeenCalledTimes(3)
    expect(listCaptures).toHaveBeenCalledWith(7, { page: 1, pageSize: 50, sort: 'uploaded', order: 'asc' })
    expect(polling.isPolling()).toBe(false)
    scope.stop()
  })

  it('pauses while the tab is hidden and polls again when it is shown', async () => {
    listCaptures.mockResolvedValue(pageOf([capture(1, 'analysing')]))
    const { scope, polling } = startPolling()
    await polling.load()

    setVisibility('hidden')
    await vi.advanceTimersByTimeAsync(120_000)
    expect(listCaptures).toHaveBeenCalledTimes(1)

    setVisibility('visible')
    await vi.advanceTimersByTimeAsync(0)
    expect(listCaptures).toHaveBeenCalledTimes(2)
    scope.stop()
  })

  it('starts polling again from 1 s when a just-uploaded capture is tracked', async () => {
    listCaptures.mockResolvedValueOnce(pageOf([capture(1, 'done')]))
    const { scope, polling } = startPolling()
    await polling.load()
    expect(polling.isPolling()).toBe(false)

    listCaptures.mockResolvedValue(pageOf([capture(1, 'done'), capture(2, 'queued')]))
    polling.track(capture(2, 'queued'))
    expect(polling.captures.value.map((c) => c.id)).toEqual([1, 2])
    expect(polling.total.value).toBe(2)
    await vi.advanceTimersByTimeAsync(1000)

    expect(listCaptures).toHaveBeenCalledTimes(2)
    expect(polling.pendingCount.value).toBe(1)
    scope.stop()
  })

  it('asks the server for another page or order, and only when it changes', async () => {
    listCaptures.mockResolvedValue(pageOf([capture(1, 'done')], 120))
    const { scope, polling } = startPolling()
    await polling.load()
    polling.showPage({ page: 1, pageSize: 50, sort: null })
    expect(listCaptures).toHaveBeenCalledTimes(1)
    polling.showPage({ page: 2, pageSize: 50, sort: { key: 'T30', order: 'desc' } })
    await vi.advanceTimersByTimeAsync(0)
    expect(listCaptures).toHaveBeenLastCalledWith(7, { page: 2, pageSize: 50, sort: 'T30', order: 'desc' })
    scope.stop()
  })
})

describe('useCaptureStatusPolling with the survey event stream', () => {
  beforeEach(() => {
    vi.useFakeTimers()
    listCaptures.mockReset()
    FakeEventSource.reset()
    setVisibility('visible')
  })
  afterEach(() => vi.useRealTimers())

  it('follows a capture through the stream without polling while it is connected', async () => {
    listCaptures.mockResolvedValue(pageOf([capture(1, 'done')]))
    const { scope, polling, stream } = startStreaming()
    expect(stream().url).toBe('/api/surveys/7/events')
    stream().ready()
    await polling.load()
    polling.track(capture(2, 'queued'))
    for (const status of ['analysing', 'done'] as const) {
      stream().emit('capture', { capture: capture(2, status), analysis: { id: 9, status, statusMessage: null, error: null } })
      expect(polling.captures.value.find((c) => c.id === 2)?.status).toBe(status)
    }
    await vi.advanceTimersByTimeAsync(120_000)
    expect(listCaptures).toHaveBeenCalledTimes(1)
    expect(polling.isPolling()).toBe(false)
    expect(polling.isLive.value).toBe(true)
    scope.stop()
  })

  it('adds a capture the stream brings before the upload answer, once, and drops a deleted one', async () => {
    listCaptures.mockResolvedValue(pageOf([capture(1, 'done')]))
    const { scope, polling, stream } = startStreaming()
    await polling.load()
    stream().ready()
    await vi.advanceTimersByTimeAsync(0)
    stream().emit('capture', { capture: capture(2, 'analysing'), analysis: { id: 9, status: 'analysing', statusMessage: null, error: null } })
    polling.track(capture(2, 'queued'))
    expect(polling.captures.value.map((c) => [c.id, c.status])).toEqual([[1, 'done'], [2, 'analysing']])
    expect(polling.total.value).toBe(2)
    stream().emit('capture-deleted', { captureId: 1 })
    polling.forget(1)
    expect(polling.captures.value.map((c) => c.id)).toEqual([2])
    expect(polling.total.value).toBe(1)
    scope.stop()
  })

  it('reads the page again when the stream connects after the first read, and on resync', async () => {
    listCaptures.mockResolvedValue(pageOf([capture(1, 'queued')]))
    const { scope, polling, stream } = startStreaming()
    await polling.load()
    stream().ready()
    await vi.advanceTimersByTimeAsync(0)
    expect(listCaptures).toHaveBeenCalledTimes(2)
    stream().emit('resync', {})
    await vi.advanceTimersByTimeAsync(0)
    expect(listCaptures).toHaveBeenCalledTimes(3)
    scope.stop()
  })

  it('polls while the stream is down and reopens it when the browser gave up', async () => {
    listCaptures.mockResolvedValue(pageOf([capture(1, 'analysing')]))
    const { scope, polling, stream } = startStreaming()
    stream().ready()
    await polling.load()
    const calls = listCaptures.mock.calls.length
    stream().fail(true)
    expect(polling.isLive.value).toBe(false)
    await vi.advanceTimersByTimeAsync(1000)
    expect(listCaptures.mock.calls.length).toBe(calls + 1)
    await vi.advanceTimersByTimeAsync(4000)
    expect(FakeEventSource.instances).toHaveLength(2)
    stream().ready()
    await vi.advanceTimersByTimeAsync(0)
    const afterReconnect = listCaptures.mock.calls.length
    await vi.advanceTimersByTimeAsync(60_000)
    expect(listCaptures.mock.calls.length).toBe(afterReconnect)
    scope.stop()
  })
})
