import { Worker } from 'bullmq'
import { Redis } from 'ioredis'
import { loadWorkerConfig } from '../server/config'
import { createSequelize } from '../server/db/createSequelize'
import { initModels } from '../server/models'
import { createObjectStore } from '../server/storage/createObjectStore'
import { logger } from '../server/logger'
import { ANALYSIS_QUEUE_NAME, type AnalysisJobPayload } from '../shared/jobs/analysisJob'
import { processAnalysisJob } from './processAnalysisJob'

// `npm run worker`: consumes the analysis queue. Safe to run many times, on any machine, against
// one Redis, one PostgreSQL and one bucket (DATABASE_URL, REDIS_URL, S3_*); it reads no local
// files. On SIGTERM it finishes the job in hand, then exits.
const config = loadWorkerConfig()
const sequelize = createSequelize(config.DATABASE_URL)
initModels(sequelize)
const connection = new Redis(config.REDIS_URL, { maxRetriesPerRequest: null })
const store = createObjectStore(config)

const worker = new Worker<AnalysisJobPayload>(ANALYSIS_QUEUE_NAME, (job) => processAnalysisJob(job, { store }), {
  connection,
  prefix: config.QUEUE_PREFIX,
  concurrency: config.WORKER_CONCURRENCY,
  lockDuration: config.WORKER_LOCK_DURATION_MS,
  stalledInterval: config.WORKER_STALLED_INTERVAL_MS,
})
worker.on('ready', () => logger.info({ queue: ANALYSIS_QUEUE_NAME, prefix: config.QUEUE_PREFIX }, 'worker ready'))
worker.on('completed', (job) => logger.info({ jobId: job.id, captureId: job.data.captureId, analysisId: job.data.analysisId }, 'analysis done'))
worker.on('failed', (job, error) => logger.warn({ jobId: job?.id, err: error }, 'analysis failed'))
worker.on('error', (error) => logger.error({ err: error }, 'worker error'))

// Closing waits for the job in hand, but with Redis gone it would wait for ever: give it a time
// limit, then exit anyway (BullMQ hands a stalled job to another worker).
const CLOSE_LIMIT_MS = 8000
let isStopping = false
async function shutdown(signal: string) {
  if (isStopping) return
  isStopping = true
  logger.info({ signal }, 'worker stopping after the job in hand')
  setTimeout(() => {
    logger.warn({ limitMs: CLOSE_LIMIT_MS }, 'worker did not close in time; exiting')
    process.exit(0)
  }, CLOSE_LIMIT_MS)
  await worker.close().catch((error: unknown) => logger.warn({ err: error }, 'worker close failed'))
  store.close()
  connection.disconnect()
  await sequelize.close().catch((error: unknown) => logger.warn({ err: error }, 'database close failed'))
  process.exit(0)
}
process.on('unhandledRejection', (reason) => {
  logger.error({ err: reason }, 'unhandled rejection in the worker; exiting so the start command restarts it')
  process.exit(1)
})
process.on('SIGTERM', () => void shutdown('SIGTERM'))
process.on('SIGINT', () => void shutdown('SIGINT'))
