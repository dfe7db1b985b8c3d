import type { AnalysisStatus } from '../../shared/jobs/analysisJob'
import type { AnalysisHeadline } from '../../shared/jobs/analysisHeadline'

/** The PostgreSQL NOTIFY channel the database triggers of migration 0012 announce changes on. */
export const ANALYSIS_CHANGES_CHANNEL = 'ringdown_analysis_changes'

/** An analysis row's state after a change (as the trigger sends it: dates as ISO strings). */
export interface AnalysisChangeNotice {
  kind: 'analysis'
  analysisId: number
  captureId: number
  surveyId: number
  status: AnalysisStatus
  statusMessage: string | null
  error: string | null
  queuedAt: string
  enqueuedAt: string | null
  finishedAt: string | null
  headline: AnalysisHeadline
}

export interface CaptureDeletedNotice {
  kind: 'capture-deleted'
  captureId: number
  surveyId: number
}

export type AnalysisChangesNotice = AnalysisChangeNotice | CaptureDeletedNotice
