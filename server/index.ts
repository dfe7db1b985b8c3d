import { Redis } from 'ioredis'
import { loadConfig } from './config'
import { createSequelize } from './db/createSequelize'
import { createApp } from './app'
import { logger } from './logger'
import { superviseAnalysisQueue } from './services/analysisJobsService'
import { startFakeSmtpInbox } from './mail/fakeSmtpInbox'
import { startStorageHousekeeping } from './storage/startStorageHousekeeping'

// The only file that listens. Stops accepting connections on SIGTERM/SIGINT, then closes pools.
const config = loadConfig()
const sequelize = createSequelize(config.DATABASE_URL)
const redis = new Redis(config.REDIS_URL, { maxRetriesPerRequest: null, lazyConnect: false })
redis.on('error', (error) => logger.warn({ err: error }, 'redis connection problem'))
// Without SMTP_URL, mail goes to a local fake inbox (files in MAIL_DIR, shown at /api/dev/mailbox).
const fakeInbox = config.SMTP_URL ? null : await startFakeSmtpInbox({ port: config.FAKE_SMTP_PORT, mailDir: config.MAIL_DIR })
if (fakeInbox) logger.info(`fake SMTP inbox on 127.0.0.1:${fakeInbox.port}, messages in ${config.MAIL_DIR}`)
const { app, queue, store, close } = createApp({ config, sequelize, redis })
// Temporary uploads of a server that stopped mid-upload, and files no row uses any more, are
// removed now and every few minutes.
const storageHousekeeping = startStorageHousekeeping(store)

// Analyses accepted while Redis was down wait without a job; queue them once it answers again, and
// settle rows whose job BullMQ lost (see superviseAnalysisQueue).
const REQUEUE_INTERVAL_MS = 10_000
function requeuePass() {
  superviseAnalysisQueue(queue).catch((error: unknown) => logger.warn({ err: error }, 'requeue pass failed'))
}
requeuePass()
const requeueTimer = setInterval(requeuePass, REQUEUE_INTERVAL_MS)

const server = app.listen(config.PORT, config.HOST, () => {
  logger.info(`Ringdown server listening on http://${config.HOST}:${config.PORT}/`)
})

let isStopping = false
async function shutdown(signal: string) {
  if (isStopping) return
  isStopping = true
  logger.info({ signal }, 'shutting down')
  clearInterval(requeueTimer)
  storageHousekeeping.stop()
  // Stop accepting, let in-flight requests finish (a few seconds at most), then close the pools.
  const drained = new Promise<void>((resolve) => server.close(() => resolve()))
  server.closeIdleConnections()
  await Promise.race([drained, new Promise((resolve) => setTimeout(resolve, 5000))])
  server.closeAllConnections()
  await Promise.allSettled([close(), sequelize.close(), redis.quit(), fakeInbox?.close()])
  store.close()
  process.exit(0)
}
process.on('unhandledRejection', (reason) => {
  logger.error({ err: reason }, 'unhandled rejection in the server; exiting so the start command restarts it')
  process.exit(1)
})
process.on('SIGTERM', () => void shutdown('SIGTERM'))
process.on('SIGINT', () => void shutdown('SIGINT'))
