import { Queue } from 'bullmq'
import type { Redis } from 'ioredis'
import { createHash } from 'node:crypto'
import { ANALYSIS_QUEUE_NAME, type AnalysisJobPayload } from '../../shared/jobs/analysisJob'

export interface AnalysisQueue {
  /** Adds the job once: the same capture and settings give the same job id. */
  enqueue(payload: Required<AnalysisJobPayload>): Promise<void>
  close(): Promise<void>
}

const ENQUEUE_TIMEOUT_MS = 3000

/** The only job producer. Retries: 3 attempts with exponential back-off from 2 s. */
export function createAnalysisQueue(connection: Redis): AnalysisQueue {
  const queue = new Queue<AnalysisJobPayload>(ANALYSIS_QUEUE_NAME, { connection })
  queue.on('error', () => {}) // connection problems surface as failed enqueues, handled by the caller
  return {
    async enqueue(payload) {
      const settingsHash = createHash('sha256').update(payload.settingsKey).digest('hex').slice(0, 16)
      const add = queue.add('analyse', payload, {
        jobId: `capture-${payload.captureId}-${settingsHash}`,
        attempts: 3,
        backoff: { type: 'exponential', delay: 2000 },
        removeOnComplete: { age: 24 * 3600 },
        removeOnFail: { age: 7 * 24 * 3600 },
      })
      await Promise.race([
        add,
        new Promise((_, reject) => setTimeout(() => reject(new Error('Redis did not answer')), ENQUEUE_TIMEOUT_MS)),
      ])
    },
    close: () => queue.close(),
  }
}
