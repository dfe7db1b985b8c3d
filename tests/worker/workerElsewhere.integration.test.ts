import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { spawn, type ChildProcess } from 'node:child_process'
import { mkdtemp, readdir, rm } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { pathToFileURL } from 'node:url'
import { createApp, type RingdownApp } from '../../server/app'
import { Analysis } from '../../server/models'
import { waitForCaptureStatus } from '../helpers/captureStatus'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { signedInAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD } from '../helpers/workspaceFixture'
import { decayingNoiseWav } from '../helpers/wavFixtures'

// A worker on "another machine": started from an empty working folder, with an environment that
// holds only the addresses of PostgreSQL, Redis and the bucket. The server side keeps no files of
// its own, so whatever the worker analyses it can only have read from S3.

let services: TestServices
let ringdown: RingdownApp
let elsewhere: string
let worker: ChildProcess | null = null

const repoRoot = path.resolve('.')

function startRemoteWorker(): ChildProcess {
  const env: NodeJS.ProcessEnv = {
    PATH: process.env.PATH,
    HOME: elsewhere,
    DATABASE_URL: services.config.DATABASE_URL,
    REDIS_URL: services.config.REDIS_URL,
    S3_ENDPOINT: services.config.S3_ENDPOINT,
    S3_BUCKET: services.config.S3_BUCKET,
    S3_REGION: services.config.S3_REGION,
    AWS_ACCESS_KEY_ID: process.env.AWS_ACCESS_KEY_ID,
    AWS_SECRET_ACCESS_KEY: process.env.AWS_SECRET_ACCESS_KEY,
    LOG_LEVEL: 'silent',
  }
  const loader = pathToFileURL(path.join(repoRoot, 'node_modules/tsx/dist/loader.mjs')).href
  return spawn(process.execPath, ['--import', loader, path.join(repoRoot, 'worker/index.ts')], { cwd: elsewhere, env, stdio: 'ignore' })
}

beforeAll(async () => {
  services = await startTestServices()
  ringdown = createApp(services)
  elsewhere = await mkdtemp(path.join(tmpdir(), 'ringdown-remote-worker-'))
})
afterAll(async () => {
  if (worker && worker.exitCode === null) {
    await new Promise((resolve) => {
      worker!.once('exit', resolve)
      worker!.kill('SIGTERM')
    })
  }
  await ringdown.close()
  await services.close()
  await rm(elsewhere, { recursive: true, force: true })
})

describe('a worker with no access to the server’s data folder', () => {
  it('analyses an upload, reading only S3, PostgreSQL and Redis', async () => {
    const fixture = await createWorkspaceFixture('Remote')
    const engineer = await signedInAgent(ringdown.app, fixture.users.engineer.email, FIXTURE_PASSWORD)
    const token = await engineer.refreshCsrf()
    const response = await engineer.agent
      .post(`/api/surveys/${fixture.sharedSurvey.id}/captures`)
      .set('x-csrf-token', token)
      .field('kind', 'impulse')
      .attach('file', Buffer.from(decayingNoiseWav({ seed: 301, t60S: 0.5 })), 'remote.wav')
    expect(response.status).toBe(202)
    worker = startRemoteWorker()

    expect(await waitForCaptureStatus(response.body.id, ['done', 'failed'], 90_000)).toBe('done')
    const analysis = await Analysis.findOne({ where: { captureId: response.body.id } })
    expect(analysis?.result?.bands.length).toBeGreaterThan(0)
    // It wrote nothing where it ran: no data folder, no spool.
    expect(await readdir(elsewhere)).toEqual([])
  }, 120_000)
})
