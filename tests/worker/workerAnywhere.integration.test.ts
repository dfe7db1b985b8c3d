import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { spawn, type ChildProcess } from 'node:child_process'
import { mkdtemp, rm, writeFile } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { pathToFileURL } from 'node:url'
import { Analysis, Capture } from '../../server/models'
import { storeUploadedFile } from '../../server/storage/storeUploadedFile'
import { createAnalysisQueue, type AnalysisQueue } from '../../server/queue/analysisQueue'
import { dispatchAnalysis, recordAnalysisRequest } from '../../server/services/analysisJobsService'
import { defaultSettingsOf } from '../../server/services/capturesService'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { createWorkspaceFixture } from '../helpers/workspaceFixture'
import { decayingNoiseWav } from '../helpers/wavFixtures'
import { waitForCaptureStatus } from '../helpers/captureStatus'

// A worker as it runs on another machine: started from an unrelated folder, with only the
// database, Redis and the file store in its environment (no session secret, no mail, no port).
let services: TestServices
let storageDir: string
let elsewhere: string
let queue: AnalysisQueue
let child: ChildProcess | null = null

beforeAll(async () => {
  storageDir = await mkdtemp(path.join(tmpdir(), 'ringdown-anywhere-files-'))
  elsewhere = await mkdtemp(path.join(tmpdir(), 'ringdown-anywhere-cwd-'))
  services = await startTestServices({ STORAGE_DIR: storageDir })
  queue = createAnalysisQueue(services.redis, { prefix: services.config.QUEUE_PREFIX })
})
afterAll(async () => {
  child?.kill('SIGKILL')
  await queue.close()
  await services.close()
  await rm(storageDir, { recursive: true, force: true })
  await rm(elsewhere, { recursive: true, force: true })
})

describe('a worker on another machine', () => {
  it('analyses a capture with nothing but DATABASE_URL, REDIS_URL and the file store set', async () => {
    const fixture = await createWorkspaceFixture('Pi')
    const bytes = decayingNoiseWav({ seed: 41 })
    const scratch = path.join(storageDir, 'incoming.wav')
    await writeFile(scratch, bytes)
    const { sha256 } = await storeUploadedFile(storageDir, scratch)
    const capture = await Capture.create({
      surveyId: fixture.sharedSurvey.id, uploadedById: null, kind: 'impulse', positionXM: null, positionYM: null, positionZM: null,
      sweepF1Hz: null, sweepF2Hz: null, sweepDurationS: null, referenceSha256: null, originalName: 'far.wav', sha256,
      byteSize: bytes.length, sampleRateHz: 48_000, bitDepth: 16, channelCount: 1, durationS: 1,
    })
    const { analysis } = await recordAnalysisRequest(capture.id, defaultSettingsOf(capture))
    await dispatchAnalysis(analysis, queue)

    const tsxLoader = pathToFileURL(path.resolve('node_modules/tsx/dist/loader.mjs')).href
    const env = { PATH: process.env.PATH ?? '', DATABASE_URL: services.config.DATABASE_URL, REDIS_URL: services.config.REDIS_URL, STORAGE_DIR: storageDir, LOG_LEVEL: 'silent' }
    child = spawn(process.execPath, ['--import', tsxLoader, path.resolve('worker/index.ts')], { cwd: elsewhere, env, stdio: ['ignore', 'ignore', 'pipe'] })
    let stderr = ''
    child.stderr?.on('data', (chunk: Buffer) => (stderr += chunk.toString()))
    const exited = new Promise<number | null>((resolve) => child!.once('exit', resolve))
    const outcome = await Promise.race([waitForCaptureStatus(capture.id, ['done', 'failed'], 90_000), exited.then((code) => `worker exited (${code}): ${stderr}`)])
    expect(outcome).toBe('done')
    expect((await Analysis.findByPk(analysis.id))!.result?.bands.length).toBeGreaterThan(5)
  }, 120_000)
})
