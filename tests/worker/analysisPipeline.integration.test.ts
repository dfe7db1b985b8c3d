import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Worker } from 'bullmq'
import { Redis } from 'ioredis'
import { createApp, type RingdownApp } from '../../server/app'
import { Analysis, Capture } from '../../server/models'
import { processAnalysisJob } from '../../worker/processAnalysisJob'
import { DEFAULT_ANALYSIS_SETTINGS } from '../../shared/jobs/analysisSettingsKey'
import { decodeWav } from '../../shared/acoustics/wav/decodeWav'
import { analyseCapture } from '../../shared/acoustics/analyseCapture'
import { ANALYSIS_QUEUE_NAME, type AnalysisJobPayload } from '../../shared/jobs/analysisJob'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { signedInAgent, type ApiAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'
import { decayingNoiseWav } from '../helpers/wavFixtures'
import { captureStatusOf, waitForCaptureStatus } from '../helpers/captureStatus'

let services: TestServices
let ringdown: RingdownApp
let fixture: WorkspaceFixture
let engineer: ApiAgent
let worker: Worker<AnalysisJobPayload>
let workerConnection: Redis

beforeAll(async () => {
  services = await startTestServices()
  ringdown = createApp(services)
  fixture = await createWorkspaceFixture('Zeta')
  engineer = await signedInAgent(ringdown.app, fixture.users.engineer.email, FIXTURE_PASSWORD)
  workerConnection = new Redis(services.config.REDIS_URL, { maxRetriesPerRequest: null })
  worker = new Worker<AnalysisJobPayload>(ANALYSIS_QUEUE_NAME, (job) => processAnalysisJob(job, { store: services.store }), { connection: workerConnection, prefix: services.config.QUEUE_PREFIX })
})
afterAll(async () => {
  await worker.close()
  await workerConnection.quit()
  await ringdown.close()
  await services.close()
})

async function uploadAndWait(bytes: Uint8Array): Promise<Capture> {
  const token = await engineer.refreshCsrf()
  const response = await engineer.agent
    .post(`/api/surveys/${fixture.sharedSurvey.id}/captures`)
    .set('x-csrf-token', token)
    .field('kind', 'impulse')
    .attach('file', Buffer.from(bytes), 'ir.wav')
  expect(response.status).toBe(202)
  await waitForCaptureStatus(response.body.id, ['done', 'failed'])
  return (await Capture.findByPk(response.body.id))!
}

describe('upload → queue → worker → analysis', () => {
  it('stores exactly the engine result for the uploaded file', async () => {
    const bytes = decayingNoiseWav({ t60S: 0.5, durationS: 1.5 })
    const capture = await uploadAndWait(bytes)
    expect(await captureStatusOf(capture.id)).toBe('done')
    const analyses = await Analysis.findAll({ where: { captureId: capture.id } })
    expect(analyses).toHaveLength(1)
    const decoded = decodeWav(bytes)
    const expected = analyseCapture(decoded.samples, { sampleRateHz: decoded.sampleRateHz, kind: 'impulse', settings: DEFAULT_ANALYSIS_SETTINGS })
    expected.warnings.push(...decoded.warnings)
    expect(analyses[0]!.result).toEqual(JSON.parse(JSON.stringify(expected)))
    const served = await engineer.get(`/api/captures/${capture.id}/analysis`)
    expect(served.status).toBe(200)
    expect(served.body.result.bands.length).toBeGreaterThan(5)
  })

  it('stores one analysis when the same job runs twice (idempotent retry)', async () => {
    const capture = await uploadAndWait(decayingNoiseWav({ seed: 11 }))
    const [analysis] = await Analysis.findAll({ where: { captureId: capture.id } })
    const rerun = { data: { analysisId: analysis!.id, captureId: capture.id }, attemptsMade: 1, opts: { attempts: 3 }, updateProgress: async () => {} }
    await processAnalysisJob(rerun, { store: services.store })
    expect(await Analysis.count({ where: { captureId: capture.id } })).toBe(1)
    expect((await analysis!.reload()).updatedAt).toEqual(analysis!.updatedAt)
  })
})
