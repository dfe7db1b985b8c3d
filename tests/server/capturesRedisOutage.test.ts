import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Queue } from 'bullmq'
import { Redis } from 'ioredis'
import { createApp, type RingdownApp } from '../../server/app'
import { createAnalysisQueue } from '../../server/queue/analysisQueue'
import { dispatchWaitingAnalyses } from '../../server/services/analysisJobsService'
import { captureStatusOf } from '../helpers/captureStatus'
import { ANALYSIS_QUEUE_NAME } from '../../shared/jobs/analysisJob'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { signedInAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'
import { decayingNoiseWav } from '../helpers/wavFixtures'

let services: TestServices
let outage: RingdownApp
let deadRedis: Redis
let fixture: WorkspaceFixture

beforeAll(async () => {
  services = await startTestServices()
  // Nothing listens on loopback port 1: every Redis command waits, as during an outage.
  deadRedis = new Redis('redis://127.0.0.1:1', { maxRetriesPerRequest: null, retryStrategy: () => 500 })
  deadRedis.on('error', () => {})
  outage = createApp({ ...services, queue: createAnalysisQueue(deadRedis) })
  fixture = await createWorkspaceFixture('Eta')
})
afterAll(async () => {
  await outage.close()
  deadRedis.disconnect()
  await services.close()
})

describe('an upload accepted while Redis is down', () => {
  it('reads uploaded and is queued exactly once when Redis is back', async () => {
    const engineer = await signedInAgent(outage.app, fixture.users.engineer.email, FIXTURE_PASSWORD)
    const token = await engineer.refreshCsrf()
    const response = await engineer.agent
      .post(`/api/surveys/${fixture.sharedSurvey.id}/captures`)
      .set('x-csrf-token', token)
      .field('kind', 'impulse')
      .attach('file', Buffer.from(decayingNoiseWav()), 'ir.wav')
    expect(response.status).toBe(202)
    expect(response.body.status).toBe('uploaded')

    const liveQueue = createAnalysisQueue(services.redis)
    expect(await dispatchWaitingAnalyses(liveQueue)).toBe(1)
    expect(await dispatchWaitingAnalyses(liveQueue)).toBe(0)
    expect(await captureStatusOf(response.body.id)).toBe('queued')
    const inspector = new Queue(ANALYSIS_QUEUE_NAME, { connection: services.redis, prefix: services.config.QUEUE_PREFIX })
    const jobs = await inspector.getJobs(['waiting'])
    expect(jobs.filter((job) => job.data.captureId === response.body.id)).toHaveLength(1)
    await Promise.all([inspector.close(), liveQueue.close()])
  })
})
