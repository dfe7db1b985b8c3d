import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { spawn, type ChildProcess } from 'node:child_process'
import { Analysis, Capture } from '../../server/models'
import { storeContentBytes } from '../../server/storage/storeContentBytes'
import { createAnalysisQueue, type AnalysisQueue } from '../../server/queue/analysisQueue'
import { dispatchAnalysis, recordAnalysisRequest } from '../../server/services/analysisJobsService'
import { DEFAULT_ANALYSIS_SETTINGS } from '../../shared/jobs/analysisSettingsKey'
import { captureStatusOf } from '../helpers/captureStatus'
import { synthesizeRoomImpulse } from '../../shared/acoustics/synthetic/synthesizeRoomImpulse'
import { encodeWav } from '../../shared/acoustics/wav/encodeWav'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { createWorkspaceFixture } from '../helpers/workspaceFixture'

let services: TestServices
let queue: AnalysisQueue
const workers: ChildProcess[] = []

/** A real `npm run worker` process, with a short lock so a killed job is picked up in seconds. */
function startWorkerProcess(): ChildProcess {
  const child = spawn(process.execPath, ['--import', 'tsx', 'worker/index.ts'], {
    env: { ...process.env, S3_BUCKET: services.config.S3_BUCKET, WORKER_LOCK_DURATION_MS: '1500', WORKER_STALLED_INTERVAL_MS: '1000', LOG_LEVEL: 'silent' },
    stdio: 'ignore',
  })
  workers.push(child)
  return child
}

async function waitFor<T>(probe: () => Promise<T | null>, timeoutMs: number, pollMs = 20): Promise<T> {
  const deadline = Date.now() + timeoutMs
  for (;;) {
    const value = await probe()
    if (value !== null) return value
    if (Date.now() > deadline) throw new Error('timed out')
    await new Promise((resolve) => setTimeout(resolve, pollMs))
  }
}

beforeAll(async () => {
  services = await startTestServices()
  queue = createAnalysisQueue(services.redis)
})
afterAll(async () => {
  for (const child of workers) child.kill('SIGKILL')
  await queue.close()
  await services.close()
})

describe('a worker killed in the middle of a job', () => {
  it('leaves the job to be completed after a restart, with exactly one analysis stored', async () => {
    const fixture = await createWorkspaceFixture('Kappa')
    // A long, high-rate capture in third-octave bands keeps the worker busy for a second or more.
    const sampleRateHz = 96_000
    const impulse = synthesizeRoomImpulse({ sampleRateHz, durationS: 20, bandDecays: [63, 125, 250, 500, 1000, 2000, 4000, 8000].map((centreHz) => ({ centreHz, T60S: 1.2 })), noiseFloorDb: -90, seed: 3 })
    const sha256 = await storeContentBytes(services.store, encodeWav(impulse, { sampleRateHz, encoding: 'float32' }))
    const capture = await Capture.create({
      surveyId: fixture.sharedSurvey.id, uploadedById: null, kind: 'impulse', positionXM: null, positionYM: null, positionZM: null,
      sweepF1Hz: null, sweepF2Hz: null, sweepDurationS: null, referenceSha256: null, originalName: 'long.wav', sha256,
      byteSize: impulse.length * 4, sampleRateHz, bitDepth: 32, channelCount: 1, durationS: 20,
    })
    const { analysis } = await recordAnalysisRequest(capture.id, { ...DEFAULT_ANALYSIS_SETTINGS, bands: 'third' })
    expect(await dispatchAnalysis(analysis, queue)).toBe(true)

    const first = startWorkerProcess()
    await waitFor(async () => ((await captureStatusOf(capture.id)) === 'analysing' ? true : null), 60_000)
    first.kill('SIGKILL')
    await new Promise((resolve) => first.once('exit', resolve))
    expect(await Analysis.count({ where: { captureId: capture.id, status: 'done' } })).toBe(0)

    startWorkerProcess()
    await waitFor(async () => ((await captureStatusOf(capture.id)) === 'done' ? true : null), 90_000, 200)
    expect(await Analysis.count({ where: { captureId: capture.id } })).toBe(1)
    expect((await analysis.reload()).attempts).toBe(2)
  }, 150_000)
})
