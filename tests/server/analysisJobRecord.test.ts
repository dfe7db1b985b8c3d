import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createHash } from 'node:crypto'
import { Queue, Worker } from 'bullmq'
import { Redis } from 'ioredis'
import { createApp, type RingdownApp } from '../../server/app'
import { Analysis, Capture } from '../../server/models'
import { storeContentBytes } from '../../server/storage/storeContentBytes'
import { defaultSettingsOf } from '../../server/services/capturesService'
import { withoutStoredContent } from '../helpers/hiddenContent'
import { analysisJobId } from '../../server/queue/analysisQueue'
import { dispatchAnalysis, dispatchWaitingAnalyses, recordAnalysisRequest, recoverStrandedAnalyses } from '../../server/services/analysisJobsService'
import { processAnalysisJob } from '../../worker/processAnalysisJob'
import { ANALYSIS_JOB_ATTEMPTS, ANALYSIS_QUEUE_NAME, type AnalysisJobPayload } from '../../shared/jobs/analysisJob'
import { DEFAULT_ANALYSIS_SETTINGS, settingsToKey } from '../../shared/jobs/analysisSettingsKey'
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
  fixture = await createWorkspaceFixture('Lambda')
  engineer = await signedInAgent(ringdown.app, fixture.users.engineer.email, FIXTURE_PASSWORD)
  workerConnection = new Redis(services.config.REDIS_URL, { maxRetriesPerRequest: null })
  worker = new Worker<AnalysisJobPayload>(ANALYSIS_QUEUE_NAME, (job) => processAnalysisJob(job, { store: services.store }), {
    connection: workerConnection,
    prefix: services.config.QUEUE_PREFIX,
  })
})
afterAll(async () => {
  await worker.close()
  await workerConnection.quit()
  await ringdown.close()
  await services.close()
})

async function upload(bytes: Uint8Array): Promise<{ id: number; sha256: string }> {
  const token = await engineer.refreshCsrf()
  const response = await engineer.agent.post(`/api/surveys/${fixture.sharedSurvey.id}/captures`).set('x-csrf-token', token).field('kind', 'impulse').attach('file', Buffer.from(bytes), 'ir.wav')
  expect(response.status).toBe(202)
  return response.body as { id: number; sha256: string }
}

async function waitForAnalysis(analysisId: number, statuses: string[], timeoutMs = 60_000): Promise<Analysis> {
  const deadline = Date.now() + timeoutMs
  for (;;) {
    const analysis = (await Analysis.findByPk(analysisId))!
    if (statuses.includes(analysis.status)) return analysis
    if (Date.now() > deadline) throw new Error(`analysis ${analysisId} stuck in ${analysis.status}`)
    await new Promise((resolve) => setTimeout(resolve, 50))
  }
}

/** Hides a stored file so the worker's read fails, and gives it back afterwards. */
function withoutStoredFile<T>(sha256: string, task: () => Promise<T>): Promise<T> {
  return withoutStoredContent(services.store, sha256, task)
}

const thirdOctave = { ...DEFAULT_ANALYSIS_SETTINGS, bands: 'third' as const, smoothing: 3 as const }

describe('the analysis row as the job record', () => {
  it('is written queued at upload and names the job; the worker finishes exactly that row', async () => {
    const { id } = await upload(decayingNoiseWav({ seed: 21 }))
    const [analysis] = await Analysis.findAll({ where: { captureId: id } })
    expect(analysis!.settings).toEqual({ ...DEFAULT_ANALYSIS_SETTINGS, channel: 0 })
    expect(analysis!.settingsKey).toBe(settingsToKey(analysis!.settings))
    const inspector = new Queue(ANALYSIS_QUEUE_NAME, { connection: services.redis, prefix: services.config.QUEUE_PREFIX })
    const job = await inspector.getJob(analysisJobId(analysis!))
    expect(job?.data).toEqual({ analysisId: analysis!.id, captureId: id })
    await inspector.close()
    const done = await waitForAnalysis(analysis!.id, ['done', 'failed'])
    expect(done.status).toBe('done')
    expect(done.attempts).toBe(1)
    expect(done.finishedAt).toBeInstanceOf(Date)
    expect(done.headlineT30S).toBeGreaterThan(0.3)
    expect(await captureStatusOf(id)).toBe('done')
  })

  it('gives one row and one job for two re-analyses with the same settings, sent at once', async () => {
    const { id } = await upload(decayingNoiseWav({ seed: 22 }))
    await waitForCaptureStatus(id, ['done'])
    const [first, second] = await Promise.all([engineer.post(`/api/captures/${id}/analyses`, thirdOctave), engineer.post(`/api/captures/${id}/analyses`, thirdOctave)])
    expect([first.status, second.status]).toEqual([202, 202])
    expect(first.body.analysisId).toBe(second.body.analysisId)
    expect([first.body.isNewRun, second.body.isNewRun].sort()).toEqual([false, true])
    expect(await Analysis.count({ where: { captureId: id, settingsKey: settingsToKey(thirdOctave) } })).toBe(1)
    await waitForAnalysis(first.body.analysisId, ['done'])
    const again = await engineer.post(`/api/captures/${id}/analyses`, thirdOctave)
    expect(again.status).toBe(200)
    expect(again.body).toMatchObject({ analysisId: first.body.analysisId, status: 'done', isNewRun: false })
    expect(await Analysis.count({ where: { captureId: id } })).toBe(2)
  })

  it('leaves the earlier successful analysis and the capture state untouched when a re-analysis fails', async () => {
    const { id, sha256 } = await upload(decayingNoiseWav({ seed: 23 }))
    await waitForCaptureStatus(id, ['done'])
    const before = (await Analysis.findOne({ where: { captureId: id, status: 'done' } }))!
    const failed = await withoutStoredFile(sha256, async () => {
      const response = await engineer.post(`/api/captures/${id}/analyses`, thirdOctave)
      expect(response.status).toBe(202)
      return waitForAnalysis(response.body.analysisId, ['done', 'failed'])
    })
    expect(failed.status).toBe('failed')
    expect(failed.error).toMatch(/stored file is missing/)
    const after = (await Analysis.findByPk(before.id))!
    expect(after.status).toBe('done')
    expect(after.result).toEqual(before.result)
    expect(after.updatedAt).toEqual(before.updatedAt)
    const capture = await engineer.get(`/api/captures/${id}`)
    expect(capture.body).toMatchObject({ status: 'done', statusMessage: null, shownAnalysisId: before.id })
    expect((await engineer.get(`/api/captures/${id}/analysis`)).body.id).toBe(before.id)
    const list = await engineer.get(`/api/captures/${id}/analyses`)
    expect(list.body.map((a: { status: string }) => a.status)).toEqual(['done', 'failed'])
  })

  it('runs a failed capture again with the same settings: it ends done or failed, never queued', async () => {
    // A capture whose file is not in storage yet: its first analysis fails ("stored file is missing").
    const bytes = decayingNoiseWav({ seed: 24 })
    const sha256 = createHash('sha256').update(bytes).digest('hex')
    const capture = await Capture.create({
      surveyId: fixture.sharedSurvey.id, uploadedById: fixture.users.engineer.id, kind: 'impulse', positionXM: null, positionYM: null, positionZM: null,
      sweepF1Hz: null, sweepF2Hz: null, sweepDurationS: null, referenceSha256: null, originalName: 'late.wav', sha256,
      byteSize: bytes.length, sampleRateHz: 48_000, bitDepth: 16, channelCount: 1, durationS: 1,
    })
    const settings = defaultSettingsOf(capture)
    const { analysis } = await recordAnalysisRequest(capture.id, settings)
    await dispatchAnalysis(analysis, ringdown.queue)
    expect((await waitForAnalysis(analysis.id, ['done', 'failed'])).status).toBe('failed')
    expect(await captureStatusOf(capture.id)).toBe('failed')

    // Same settings, file still missing: the kept failed job does not swallow the request; it fails again.
    const retried = await engineer.post(`/api/captures/${capture.id}/analyses`, settings)
    expect(retried.status).toBe(202)
    expect(retried.body).toMatchObject({ analysisId: analysis.id, status: 'queued', isNewRun: true })
    const second = await waitForAnalysis(analysis.id, ['done', 'failed'])
    expect(second.status).toBe('failed')
    expect(second.queuedAt.getTime()).toBeGreaterThan(analysis.queuedAt.getTime())

    // Same settings once the file is there: it runs and ends done, in the same row.
    await storeContentBytes(services.store, bytes)
    const fixed = await engineer.post(`/api/captures/${capture.id}/analyses`, settings)
    expect(fixed.status).toBe(202)
    expect((await waitForAnalysis(analysis.id, ['done', 'failed'])).status).toBe('done')
    expect(await captureStatusOf(capture.id)).toBe('done')
    expect(await Analysis.count({ where: { captureId: capture.id } })).toBe(1)
  })
})

describe('the queue pass', () => {
  it('queues again a row whose job BullMQ lost, and fails it once its attempts are used up', async () => {
    const { id } = await upload(decayingNoiseWav({ seed: 25 }))
    await waitForCaptureStatus(id, ['done'])
    const extra = { ...DEFAULT_ANALYSIS_SETTINGS, smoothing: 12 as const }
    // A row that says it is in the queue, with no job behind it (as after a Redis data loss).
    const { analysis } = await recordAnalysisRequest(id, extra)
    await Analysis.update({ enqueuedAt: new Date() }, { where: { id: analysis.id } })
    expect(await recoverStrandedAnalyses(ringdown.queue, { strandedAfterMs: 0 })).toBe(1)
    const requeued = (await Analysis.findByPk(analysis.id))!
    expect(requeued).toMatchObject({ status: 'queued', enqueuedAt: null })
    expect(await dispatchWaitingAnalyses(ringdown.queue)).toBe(1)
    expect((await waitForAnalysis(analysis.id, ['done', 'failed'])).status).toBe('done')

    const { analysis: stuck } = await recordAnalysisRequest(id, { ...extra, smoothing: 24 })
    await Analysis.update({ enqueuedAt: new Date(), status: 'analysing', attempts: ANALYSIS_JOB_ATTEMPTS }, { where: { id: stuck.id } })
    expect(await recoverStrandedAnalyses(ringdown.queue, { strandedAfterMs: 0 })).toBe(1)
    const failed = (await Analysis.findByPk(stuck.id))!
    expect(failed.status).toBe('failed')
    expect(failed.error).toMatch(/Analyse the capture again/)
    expect(await captureStatusOf(id)).toBe('done')
  })
})
