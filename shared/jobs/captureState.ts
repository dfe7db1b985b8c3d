import type { AnalysisStatus, CaptureStatus } from './analysisJob'

/** What the derivation needs of one analysis row (no result). */
export interface AnalysisState {
  id: number
  status: AnalysisStatus
  statusMessage: string | null
  error: string | null
  /** When the row was (last) queued; a failed analysis queued again gets a new time. */
  queuedAt: Date
  /** When BullMQ accepted the job; null while Redis was unreachable. */
  enqueuedAt: Date | null
  finishedAt: Date | null
}

export interface CaptureState {
  status: CaptureStatus
  statusMessage: string | null
  /** The analysis whose figures the capture shows: the preferred (counting) one when done, else the newest done. */
  shownAnalysisId: number | null
}

const newestFirst = (key: 'queuedAt' | 'finishedAt') => (a: AnalysisState, b: AnalysisState) =>
  (b[key]?.getTime() ?? 0) - (a[key]?.getTime() ?? 0) || b.id - a.id

/**
 * A capture's state from its analyses, in one place. A capture with a finished analysis is done,
 * whatever later re-analyses do (a failed re-analysis leaves it done); without one it takes the
 * state of its newest analysis. The preferred analysis (the one that counts: pinned, or the
 * survey's default rule), when done, is the one shown.
 */
export function deriveCaptureState(analyses: readonly AnalysisState[], options: { preferredAnalysisId?: number | null } = {}): CaptureState {
  const done = analyses.filter((a) => a.status === 'done').sort(newestFirst('finishedAt'))
  const preferred = done.find((a) => a.id === options.preferredAnalysisId)
  const shown = preferred ?? done[0]
  if (shown) return { status: 'done', statusMessage: null, shownAnalysisId: shown.id }
  const newest = [...analyses].sort(newestFirst('queuedAt'))[0]
  if (!newest) return { status: 'uploaded', statusMessage: 'Not analysed yet', shownAnalysisId: null }
  if (newest.status === 'failed') return { status: 'failed', statusMessage: newest.error ?? 'The analysis failed.', shownAnalysisId: null }
  if (newest.status === 'queued' && newest.enqueuedAt === null) return { status: 'uploaded', statusMessage: 'Waiting for the queue', shownAnalysisId: null }
  if (newest.status === 'queued') return { status: 'queued', statusMessage: newest.statusMessage ?? 'Waiting for a worker', shownAnalysisId: null }
  return { status: 'analysing', statusMessage: newest.statusMessage ?? 'Analysing', shownAnalysisId: null }
}
