/** The one queue the server produces to and the worker consumes. */
export const ANALYSIS_QUEUE_NAME = 'analysis'

/** Audio never travels through Redis: the job names the capture, the worker reads the file. */
export interface AnalysisJobPayload {
  captureId: number
  /** The analysis settings key (see shared/types/analysis.ts AnalysisSettings). */
  settingsKey?: string
}

export const CAPTURE_STATUSES = ['uploaded', 'queued', 'analysing', 'done', 'failed'] as const
export type CaptureStatus = (typeof CAPTURE_STATUSES)[number]
