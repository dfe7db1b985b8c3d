import { Redis } from 'ioredis'
import { loadConfig } from './config'
import { createSequelize } from './db/createSequelize'
import { createApp } from './app'
import { logger } from './logger'
import { requeueUploadedCaptures } from './services/capturesService'

// The only file that listens. Stops accepting connections on SIGTERM/SIGINT, then closes pools.
const config = loadConfig()
const sequelize = createSequelize(config.DATABASE_URL)
const redis = new Redis(config.REDIS_URL, { maxRetriesPerRequest: null, lazyConnect: false })
redis.on('error', (error) => logger.warn({ err: error }, 'redis connection problem'))
const { app, queue, close } = createApp({ config, sequelize, redis })

// Captures accepted while Redis was down stay `uploaded`; queue them once it answers again.
const REQUEUE_INTERVAL_MS = 10_000
function requeuePass() {
  requeueUploadedCaptures(queue).catch((error: unknown) => logger.warn({ err: error }, 'requeue pass failed'))
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
  server.close()
  server.closeAllConnections()
  await Promise.allSettled([close(), sequelize.close(), redis.quit()])
  process.exit(0)
}
process.on('SIGTERM', () => void shutdown('SIGTERM'))
process.on('SIGINT', () => void shutdown('SIGINT'))
