import { describe, expect, it } from 'vitest'
import { deriveCaptureState, type AnalysisState } from '../../../shared/jobs/captureState'
import { headlineOf } from '../../../shared/jobs/analysisHeadline'
import type { AnalysisResult } from '../../../shared/types/analysis'

const at = (minute: number) => new Date(Date.UTC(2026, 0, 1, 10, minute))

function analysis(id: number, status: AnalysisState['status'], minute: number, extra: Partial<AnalysisState> = {}): AnalysisState {
  return {
    id,
    status,
    statusMessage: null,
    error: status === 'failed' ? 'The stored file is missing.' : null,
    queuedAt: at(minute),
    enqueuedAt: at(minute),
    finishedAt: status === 'done' || status === 'failed' ? at(minute + 1) : null,
    ...extra,
  }
}

describe('deriveCaptureState', () => {
  it('returns done with the newest done analysis shown when a later re-analysis failed or runs', () => {
    const state = deriveCaptureState([analysis(1, 'done', 0), analysis(2, 'done', 5), analysis(3, 'failed', 10), analysis(4, 'analysing', 12)])
    expect(state).toEqual({ status: 'done', statusMessage: null, shownAnalysisId: 2 })
  })

  it('returns the pinned analysis as shown when it is done, and ignores a pin that is not', () => {
    const rows = [analysis(1, 'done', 0), analysis(2, 'done', 5), analysis(3, 'failed', 10)]
    expect(deriveCaptureState(rows, { preferredAnalysisId: 1 }).shownAnalysisId).toBe(1)
    expect(deriveCaptureState(rows, { preferredAnalysisId: 3 }).shownAnalysisId).toBe(2)
  })

  it('returns the newest analysis state when none is done, with its message', () => {
    expect(deriveCaptureState([analysis(1, 'failed', 0)])).toEqual({ status: 'failed', statusMessage: 'The stored file is missing.', shownAnalysisId: null })
    expect(deriveCaptureState([analysis(1, 'failed', 0), analysis(2, 'queued', 3)]).status).toBe('queued')
    expect(deriveCaptureState([analysis(1, 'analysing', 0, { statusMessage: 'Analysing bands' })])).toMatchObject({ status: 'analysing', statusMessage: 'Analysing bands' })
  })

  it('returns uploaded while the queued analysis has not reached the queue, and without analyses', () => {
    expect(deriveCaptureState([analysis(1, 'queued', 0, { enqueuedAt: null })])).toMatchObject({ status: 'uploaded', statusMessage: 'Waiting for the queue' })
    expect(deriveCaptureState([]).status).toBe('uploaded')
  })

  it('returns a failed capture to queued when the same settings are queued again (newer queued time)', () => {
    const requeued = analysis(1, 'queued', 20, { error: null, finishedAt: null })
    expect(deriveCaptureState([requeued]).status).toBe('queued')
  })
})

describe('headlineOf', () => {
  it('returns the mean over the 500 Hz and 1 kHz octaves, skipping absent values', () => {
    const band = (centreHz: number, T30: number | null, C80: number | null) => ({ centreHz, T30, T20: T30, EDT: T30, C80 })
    const result = { bands: [band(250, 9, 9), band(500, 0.4, 2), band(1000, 0.6, null), band(2000, 9, 9)] } as unknown as AnalysisResult
    // Arithmetic mean of the two mid octaves: (0.4 + 0.6) / 2 = 0.5 s; C80 only at 500 Hz.
    expect(headlineOf(result)).toEqual({ T30S: 0.5, T20S: 0.5, EDTS: 0.5, C80Db: 2 })
  })
})
