// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { effectScope, ref } from 'vue'
import type { CaptureStatus } from '@shared/jobs/analysisJob'
import type { CaptureListItem } from '@/api/captures'

const listCaptures = vi.fn<(surveyId: number) => Promise<CaptureListItem[]>>()
vi.mock('@/api/captures', () => ({ listCaptures: (surveyId: number) => listCaptures(surveyId) }))
const { useCaptureStatusPolling } = await import('@/composables/useCaptureStatusPolling')

function capture(id: number, status: CaptureStatus): CaptureListItem {
  return { id, status, statusMessage: null } as CaptureListItem
}

function setVisibility(state: 'visible' | 'hidden'): void {
  Object.defineProperty(document, 'visibilityState', { configurable: true, get: () => state })
  document.dispatchEvent(new Event('visibilitychange'))
}

describe('useCaptureStatusPolling', () => {
  beforeEach(() => {
    vi.useFakeTimers()
    listCaptures.mockReset()
    setVisibility('visible')
  })
  afterEach(() => vi.useRealTimers())

  it('returns live statuses and stops polling when every capture is done or failed', async () => {
    const answers = [[capture(1, 'queued')], [capture(1, 'analysing')], [capture(1, 'done')]]
    listCaptures.mockImplementation(async () => answers.shift() ?? [capture(1, 'done')])
    const scope = effectScope()
    const polling = scope.run(() => useCaptureStatusPolling(ref(7)))!

    await polling.load()
    expect(polling.captures.value[0]?.status).toBe('queued')
    await vi.advanceTimersByTimeAsync(1000)
    expect(polling.captures.value[0]?.status).toBe('analysing')
    await vi.advanceTimersByTimeAsync(2000)
    expect(polling.captures.value[0]?.status).toBe('done')
    await vi.advanceTimersByTimeAsync(60_000)

    expect(listCaptures).toHaveBeenCalledTimes(3)
    expect(listCaptures).toHaveBeenCalledWith(7)
    expect(polling.isPolling()).toBe(false)
    scope.stop()
  })

  it('pauses while the tab is hidden and polls again when it is shown', async () => {
    listCaptures.mockResolvedValue([capture(1, 'analysing')])
    const scope = effectScope()
    const polling = scope.run(() => useCaptureStatusPolling(ref(7)))!
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
    listCaptures.mockResolvedValueOnce([capture(1, 'done')])
    const scope = effectScope()
    const polling = scope.run(() => useCaptureStatusPolling(ref(7)))!
    await polling.load()
    expect(polling.isPolling()).toBe(false)

    listCaptures.mockResolvedValue([capture(1, 'done'), capture(2, 'queued')])
    polling.track(capture(2, 'queued'))
    expect(polling.captures.value.map((c) => c.id)).toEqual([1, 2])
    await vi.advanceTimersByTimeAsync(1000)

    expect(listCaptures).toHaveBeenCalledTimes(2)
    expect(polling.pendingCount.value).toBe(1)
    scope.stop()
  })
})
