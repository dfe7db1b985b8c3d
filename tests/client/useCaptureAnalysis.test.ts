// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { effectScope, nextTick, ref } from 'vue'
import type { AnalysisDto, AnalysisListItemDto } from '@shared/api'
import type { AnalysisStatus } from '@shared/jobs/analysisJob'
import type { AnalysisSettings } from '@shared/types/analysis'
import type { CaptureListItem } from '@/api/captures'
import { FakeEventSource } from './fakeEventSource'

const api = {
  getCapture: vi.fn<(id: number) => Promise<CaptureListItem>>(),
  listAnalyses: vi.fn<(id: number) => Promise<AnalysisListItemDto[]>>(),
  getAnalysis: vi.fn<(id: number, analysisId?: number) => Promise<AnalysisDto>>(),
  requestAnalysis: vi.fn<(id: number, settings: AnalysisSettings) => Promise<unknown>>(),
}
vi.mock('@/api/captures', () => ({
  getCapture: (id: number) => api.getCapture(id),
  listAnalyses: (id: number) => api.listAnalyses(id),
  getAnalysis: (id: number, analysisId?: number) => api.getAnalysis(id, analysisId),
  requestAnalysis: (id: number, settings: AnalysisSettings) => api.requestAnalysis(id, settings),
}))
const { useCaptureAnalysis } = await import('@/composables/useCaptureAnalysis')

const octave: AnalysisSettings = { bands: 'octave', smoothing: 6, channel: 0, gateMs: null, timeReversedFiltering: true }
const third: AnalysisSettings = { ...octave, bands: 'third' }
const done = { id: 3, surveyId: 7, status: 'done', statusMessage: null } as CaptureListItem
const item = (id: number, settings: AnalysisSettings, status: AnalysisStatus): AnalysisListItemDto =>
  ({ id, settings, status, error: status === 'failed' ? 'The stored file is missing.' : null } as AnalysisListItemDto)

describe('useCaptureAnalysis', () => {
  beforeEach(() => {
    vi.useFakeTimers()
    FakeEventSource.reset()
    for (const mock of Object.values(api)) mock.mockReset()
    api.getCapture.mockResolvedValue(done)
    api.getAnalysis.mockResolvedValue({ id: 1 } as AnalysisDto)
    api.requestAnalysis.mockResolvedValue({})
  })
  afterEach(() => vi.useRealTimers())

  it('stops waiting when the re-analysis fails and keeps showing the earlier analysis, led by the stream', async () => {
    api.listAnalyses.mockResolvedValue([item(1, octave, 'done')])
    const scope = effectScope()
    const state = scope.run(() => useCaptureAnalysis(ref(3), { events: { createSource: FakeEventSource.create } }))!
    await vi.advanceTimersByTimeAsync(0)
    await nextTick()
    const stream = FakeEventSource.instances[0]!
    expect(stream.url).toBe('/api/surveys/7/events')
    stream.ready()
    await vi.advanceTimersByTimeAsync(0)
    expect(state.analysis.value?.id).toBe(1)

    api.listAnalyses.mockResolvedValue([item(1, octave, 'done'), item(2, third, 'queued')])
    await state.applySettings(third)
    expect(state.waitingFor.value).toEqual(third)
    const pollsBefore = api.getCapture.mock.calls.length
    await vi.advanceTimersByTimeAsync(30_000)
    expect(api.getCapture.mock.calls.length).toBe(pollsBefore)

    api.listAnalyses.mockResolvedValue([item(1, octave, 'done'), item(2, third, 'failed')])
    stream.emit('capture', { capture: done, analysis: { id: 2, status: 'failed', statusMessage: null, error: 'The stored file is missing.' } })
    await vi.advanceTimersByTimeAsync(0)
    expect(state.waitingFor.value).toBeNull()
    expect(state.analysis.value?.id).toBe(1)
    expect(state.analyses.value.map((a) => a.status)).toEqual(['done', 'failed'])
    expect(api.getCapture.mock.calls.length).toBe(pollsBefore)
    scope.stop()
  })

  it('polls while no stream is connected and shows the re-analysis once done', async () => {
    api.listAnalyses.mockResolvedValue([item(1, octave, 'done')])
    const scope = effectScope()
    const state = scope.run(() => useCaptureAnalysis(ref(3), { events: { createSource: FakeEventSource.create } }))!
    await vi.advanceTimersByTimeAsync(0)
    api.listAnalyses.mockResolvedValue([item(1, octave, 'done'), item(2, third, 'analysing')])
    await state.applySettings(third)
    api.listAnalyses.mockResolvedValue([item(1, octave, 'done'), item(2, third, 'done')])
    api.getAnalysis.mockResolvedValue({ id: 2 } as AnalysisDto)
    await vi.advanceTimersByTimeAsync(1000)
    expect(state.waitingFor.value).toBeNull()
    expect(api.getAnalysis).toHaveBeenLastCalledWith(3, 2)
    scope.stop()
  })
})
