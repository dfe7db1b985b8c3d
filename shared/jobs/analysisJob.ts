/** The one queue the server produces to and the worker consumes. */
export const ANALYSIS_QUEUE_NAME = 'analysis'

/**
 * BullMQ's key prefix. The braces are a Redis Cluster hash tag: every key of the queue hashes to
 * one slot, which BullMQ's multi-key scripts need on a cluster (BullMQ docs, "Redis Cluster").
 */
export const DEFAULT_QUEUE_PREFIX = '{ringdown}'

/**
 * Audio never travels through Redis: the job names the analysis row (its job record), the worker
 * reads the file. `captureId` is there for logs; `settingsKey` alone (without `analysisId`) is the
 * payload of jobs queued before analyses were job records.
 */
export interface AnalysisJobPayload {
  analysisId?: number
  captureId: number
  /** The analysis settings key (see shared/jobs/analysisSettingsKey.ts). */
  settingsKey?: string
}

/** How often BullMQ runs a job before the analysis is marked failed. */
export const ANALYSIS_JOB_ATTEMPTS = 3

/** The job record's life: queued → analysing → done | failed (failed may be queued again). */
export const ANALYSIS_STATUSES = ['queued', 'analysing', 'done', 'failed'] as const
export type AnalysisStatus = (typeof ANALYSIS_STATUSES)[number]

/** A capture's state, derived from its analyses (`uploaded`: accepted, not yet in the queue). */
export const CAPTURE_STATUSES = ['uploaded', 'queued', 'analysing', 'done', 'failed'] as const
export type CaptureStatus = (typeof CAPTURE_STATUSES)[number]
