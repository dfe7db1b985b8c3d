import type { AddressInfo } from 'node:net'
import type { Server } from 'node:http'
import { existsSync } from 'node:fs'
import path from 'node:path'
import { createApp } from '../../server/app'
import type { Mailer } from '../../server/mail/mailer'
import { seedDemoData } from '../../server/db/demoData'
import { startTestServices, type TestServices } from './testServices'
import { Worker } from 'bullmq'
import { Redis } from 'ioredis'
import { processAnalysisJob } from '../../worker/processAnalysisJob'
import { superviseAnalysisQueue } from '../../server/services/analysisJobsService'
import { ANALYSIS_QUEUE_NAME, type AnalysisJobPayload } from '../../shared/jobs/analysisJob'

export interface RunningApp {
  baseUrl: string
  services: TestServices
  stop: () => Promise<void>
}

/**
 * The built client served by a real server on a free loopback port, with the demo data seeded.
 * With `withWorker`, an analysis worker runs in-process and the demo captures are queued, as
 * `npm start` does.
 */
export async function startRunningApp(options: { withWorker?: boolean; mailer?: Mailer } = {}): Promise<RunningApp> {
  const clientDir = path.resolve('dist')
  if (!existsSync(path.join(clientDir, 'index.html'))) {
    throw new Error('Browser tests need the built client: run `npm run build` first (npm run test:all does).')
  }
  const services = await startTestServices()
  await seedDemoData(services.sequelize, { store: services.store })
  const ringdown = createApp({ ...services, clientDir, ...(options.mailer ? { mailer: options.mailer } : {}) })
  const server: Server = await new Promise((resolve) => {
    const listening = ringdown.app.listen(0, '127.0.0.1', () => resolve(listening))
  })
  const { port } = server.address() as AddressInfo
  let worker: Worker<AnalysisJobPayload> | null = null
  let workerConnection: Redis | null = null
  if (options.withWorker) {
    workerConnection = new Redis(services.config.REDIS_URL, { maxRetriesPerRequest: null })
    const { store } = services
    worker = new Worker<AnalysisJobPayload>(ANALYSIS_QUEUE_NAME, (job) => processAnalysisJob(job, { store }), { connection: workerConnection, prefix: services.config.QUEUE_PREFIX })
    await superviseAnalysisQueue(ringdown.queue)
  }
  return {
    baseUrl: `http://127.0.0.1:${port}`,
    services,
    stop: async () => {
      await worker?.close()
      await workerConnection?.quit()
      server.closeAllConnections()
      await new Promise<void>((resolve) => server.close(() => resolve()))
      await ringdown.close()
      await services.close()
    },
  }
}
