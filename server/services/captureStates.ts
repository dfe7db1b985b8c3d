import { Analysis } from '../models'
import { deriveCaptureState, type AnalysisState, type CaptureState } from '../../shared/jobs/captureState'
import type { AnalysisHeadline } from '../../shared/jobs/analysisHeadline'

/** A capture's derived state and the headline figures of the analysis it shows. */
export interface CaptureView {
  state: CaptureState
  headline: AnalysisHeadline | null
  /** The finished analysis that counts in averages, verdicts and reports; null when none does. */
  countingAnalysisId: number | null
}

export interface AnalysisStateRow extends AnalysisState {
  captureId: number
  headline: AnalysisHeadline
}

/** The columns the derivation and the list need: never the result. */
const STATE_ATTRIBUTES = ['id', 'captureId', 'status', 'statusMessage', 'error', 'queuedAt', 'enqueuedAt', 'finishedAt', 'headlineT30S', 'headlineT20S', 'headlineEDTS', 'headlineC80Db'] as const

export function toStateRow(analysis: Analysis): AnalysisStateRow {
  return {
    id: analysis.id,
    captureId: analysis.captureId,
    status: analysis.status,
    statusMessage: analysis.statusMessage,
    error: analysis.error,
    queuedAt: analysis.queuedAt,
    enqueuedAt: analysis.enqueuedAt,
    finishedAt: analysis.finishedAt,
    headline: { T30S: analysis.headlineT30S, T20S: analysis.headlineT20S, EDTS: analysis.headlineEDTS, C80Db: analysis.headlineC80Db },
  }
}

/**
 * Derives one capture's view from its analysis rows. `countingAnalysisId` is the analysis that
 * counts for the capture (countingAnalyses: pinned, or the survey's default rule); when done it is
 * the one shown.
 */
export function captureViewOf(rows: readonly AnalysisStateRow[], countingAnalysisId: number | null = null): CaptureView {
  const state = deriveCaptureState(rows, { preferredAnalysisId: countingAnalysisId })
  const shown = rows.find((row) => row.id === state.shownAnalysisId)
  const isCountingDone = rows.some((row) => row.id === countingAnalysisId && row.status === 'done')
  return { state, headline: shown?.headline ?? null, countingAnalysisId: isCountingDone ? countingAnalysisId : null }
}

/**
 * The analysis rows of some captures, without results, keyed by capture id. `override` replaces
 * one row by a state announced by a notification, so a stream reports each change in order even
 * when the row has moved on by the time it is read.
 */
export async function loadAnalysisStates(captureIds: readonly number[], override?: AnalysisStateRow): Promise<Map<number, AnalysisStateRow[]>> {
  const byCapture = new Map<number, AnalysisStateRow[]>(captureIds.map((id) => [id, []]))
  if (captureIds.length === 0) return byCapture
  const analyses = await Analysis.findAll({ where: { captureId: [...captureIds] }, attributes: [...STATE_ATTRIBUTES] })
  for (const row of analyses.map(toStateRow)) {
    const current = override && override.id === row.id ? override : row
    byCapture.get(row.captureId)?.push(current)
  }
  if (override && !analyses.some((a) => a.id === override.id)) byCapture.get(override.captureId)?.push(override)
  return byCapture
}

/** Views of some captures, each with the id of the analysis that counts for it, where known. */
export async function loadCaptureViews(captures: readonly { id: number; countingAnalysisId?: number | null }[], override?: AnalysisStateRow): Promise<Map<number, CaptureView>> {
  const states = await loadAnalysisStates(captures.map((c) => c.id), override)
  return new Map(captures.map((capture) => [capture.id, captureViewOf(states.get(capture.id) ?? [], capture.countingAnalysisId ?? null)]))
}
