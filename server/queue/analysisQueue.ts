import { Queue } from 'bullmq'
import type { Redis } from 'ioredis'
import { ANALYSIS_JOB_ATTEMPTS, ANALYSIS_QUEUE_NAME, DEFAULT_QUEUE_PREFIX, type AnalysisJobPayload } from '../../shared/jobs/analysisJob'

export interface AnalysisQueue {
  /** Adds the job once: the same job id (one queuing of one analysis row) is added only once. */
  enqueue(payload: Required<Pick<AnalysisJobPayload, 'analysisId' | 'captureId'>>, jobId: string): Promise<void>
  /** BullMQ's state of a job ('unknown' once it is gone), for the queue pass that finds stranded rows. */
  jobState(jobId: string): Promise<string>
  close(): Promise<void>
}

const ENQUEUE_TIMEOUT_MS = 3000

/**
 * The job id of one queuing of an analysis row. A failed analysis queued again gets a new queued
 * time and so a new job: a kept failed job with the old id can never swallow the new request.
 */
export function analysisJobId(analysis: { id: number; queuedAt: Date }): string {
  return `analysis-${analysis.id}-${analysis.queuedAt.getTime()}`
}

function withTimeout<T>(promise: Promise<T>): Promise<T> {
  return Promise.race([promise, new Promise<never>((_, reject) => setTimeout(() => reject(new Error('Redis did not answer')), ENQUEUE_TIMEOUT_MS))])
}

/** The only job producer. Retries: 3 attempts with exponential back-off from 2 s. */
export function createAnalysisQueue(connection: Redis, options: { prefix?: string } = {}): AnalysisQueue {
  const queue = new Queue<AnalysisJobPayload>(ANALYSIS_QUEUE_NAME, { connection, prefix: options.prefix ?? DEFAULT_QUEUE_PREFIX })
  queue.on('error', () => {}) // connection problems surface as failed enqueues, handled by the caller
  return {
    async enqueue(payload, jobId) {
      await withTimeout(
        queue.add('analyse', payload, {
          jobId,
          attempts: ANALYSIS_JOB_ATTEMPTS,
          backoff: { type: 'exponential', delay: 2000 },
          removeOnComplete: { age: 24 * 3600 },
          removeOnFail: { age: 7 * 24 * 3600 },
        }),
      )
    },
    jobState: (jobId) => withTimeout(queue.getJobState(jobId)),
    close: () => queue.close(),
  }
}
