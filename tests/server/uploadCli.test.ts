import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { execFile } from 'node:child_process'
import { mkdtemp, rm, writeFile } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import type { AddressInfo } from 'node:net'
import type { Server } from 'node:http'
import { Worker } from 'bullmq'
import { Redis } from 'ioredis'
import { createApp, type RingdownApp } from '../../server/app'
import { createApiToken } from '../../server/services/apiTokensService'
import { processAnalysisJob } from '../../worker/processAnalysisJob'
import { ANALYSIS_QUEUE_NAME, type AnalysisJobPayload } from '../../shared/jobs/analysisJob'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { createWorkspaceFixture, type WorkspaceFixture } from '../helpers/workspaceFixture'

let services: TestServices
let storageDir: string
let ringdown: RingdownApp
let server: Server
let worker: Worker<AnalysisJobPayload>
let workerConnection: Redis
let baseUrl: string
let a: WorkspaceFixture
let engineerToken: string
let viewerToken: string

beforeAll(async () => {
  storageDir = await mkdtemp(path.join(tmpdir(), 'ringdown-upload-cli-'))
  services = await startTestServices({ STORAGE_DIR: storageDir })
  ringdown = createApp({ ...services, clientDir: path.join(storageDir, 'no-client') })
  server = await new Promise((resolve) => {
    const listening = ringdown.app.listen(0, '127.0.0.1', () => resolve(listening))
  })
  baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`
  workerConnection = new Redis(services.config.REDIS_URL, { maxRetriesPerRequest: null })
  worker = new Worker<AnalysisJobPayload>(ANALYSIS_QUEUE_NAME, (job) => processAnalysisJob(job, { store: services.store }), { connection: workerConnection, prefix: services.config.QUEUE_PREFIX })
  a = await createWorkspaceFixture('Omicron')
  engineerToken = (await createApiToken(a.users.engineer.id, { name: 'Rig', workspaceId: a.workspace.id, role: 'engineer', expiresInDays: 90 })).secret
  viewerToken = (await createApiToken(a.users.viewer.id, { name: 'Viewer script', workspaceId: a.workspace.id, role: 'viewer', expiresInDays: 90 })).secret
})
afterAll(async () => {
  await worker.close()
  await workerConnection.quit()
  server.closeAllConnections()
  await new Promise<void>((resolve) => server.close(() => resolve()))
  await ringdown.close()
  await services.close()
  await rm(storageDir, { recursive: true, force: true })
})

interface CliRun {
  code: number
  stdout: string
  stderr: string
}

/** Runs the uploader as a person would, in a child process (the server answers from this one). */
function runUploader(args: string[], env: NodeJS.ProcessEnv = {}): Promise<CliRun> {
  return new Promise((resolve) => {
    execFile('npx', ['tsx', 'cli/upload.ts', ...args], { cwd: process.cwd(), env: { ...process.env, RINGDOWN_TOKEN: '', ...env }, timeout: 120_000 }, (error, stdout, stderr) => {
      resolve({ code: error ? (typeof error.code === 'number' ? error.code : 1) : 0, stdout, stderr })
    })
  })
}

const SMALL_ROOM = 'samples/small-room-ir.wav'
const TREATED_ROOM = 'samples/treated-room-ir.wav'

describe('npm run upload (cli/upload.ts)', () => {
  it('uploads two samples into a survey, waits for their analysis and prints T30 at 1 kHz as JSON', async () => {
    const run = await runUploader(['--url', baseUrl, '--token', engineerToken, '--survey', String(a.sharedSurvey.id), '--json', SMALL_ROOM, TREATED_ROOM])
    expect(run.code, run.stderr).toBe(0)
    const results = JSON.parse(run.stdout) as { file: string; captureId: number; status: string; band1kHz: { T30S: number } }[]
    expect(results.map((r) => [r.file, r.status])).toEqual([[SMALL_ROOM, 'done'], [TREATED_ROOM, 'done']])
    // The samples were synthesised with T60 = 0.35 s (small room) and 0.20 s (treated) at 1 kHz
    // (samples/README.md); for an exponential decay ISO 3382-2 T30 equals T60. The README notes the
    // analysed values lie within 0.02 s of the table from 500 Hz up.
    expect(Math.abs(results[0]!.band1kHz.T30S - 0.35)).toBeLessThan(0.03)
    expect(Math.abs(results[1]!.band1kHz.T30S - 0.2)).toBeLessThan(0.03)
    expect(run.stderr).toMatch(/small-room-ir\.wav: uploading 100%/)
    expect(run.stderr).toMatch(/treated-room-ir\.wav: done/)
  })

  it('takes the token from RINGDOWN_TOKEN and prints a table', async () => {
    const run = await runUploader(['--url', baseUrl, '--survey', String(a.sharedSurvey.id), TREATED_ROOM], { RINGDOWN_TOKEN: engineerToken })
    expect(run.code, run.stderr).toBe(0)
    const [header, row] = run.stdout.trim().split('\n')
    expect(header).toMatch(/^File\s+Capture\s+Status\s+T30 1 kHz s\s+T20 1 kHz s\s+EDT 1 kHz s$/)
    const t30S = Number(row!.trim().split(/\s+/)[3])
    expect(Math.abs(t30S - 0.2)).toBeLessThan(0.03) // samples/README.md: 0.20 s at 1 kHz
  })

  it('exits non-zero with one line when the token is bad', async () => {
    const run = await runUploader(['--url', baseUrl, '--token', `rdt_${'x'.repeat(43)}`, '--survey', String(a.sharedSurvey.id), SMALL_ROOM, TREATED_ROOM])
    expect(run.code).not.toBe(0)
    expect(run.stdout).toBe('')
    expect(run.stderr.trim().split('\n')).toEqual([expect.stringMatching(/^ringdown upload: the server refused the API token: That API token is not valid/)])
  })

  it('exits non-zero with one line when the token’s role may not upload', async () => {
    const run = await runUploader(['--url', baseUrl, '--token', viewerToken, '--survey', String(a.sharedSurvey.id), SMALL_ROOM])
    expect(run.code).not.toBe(0)
    expect(run.stderr.trim().split('\n')).toEqual(['ringdown upload: the token\'s role (viewer) may not add captures to survey ' + a.sharedSurvey.id])
  })

  it('analyses the good files and names each refused one on its own line', async () => {
    const notAudio = path.join(storageDir, 'notes.wav')
    await writeFile(notAudio, 'these are notes from the site visit, not audio'.repeat(10))
    const run = await runUploader(['--url', baseUrl, '--token', engineerToken, '--survey', String(a.sharedSurvey.id), '--json', notAudio, SMALL_ROOM])
    expect(run.code).toBe(1)
    const results = JSON.parse(run.stdout) as { status: string }[]
    expect(results.map((r) => r.status)).toEqual(['failed', 'done'])
    const lines = run.stderr.trim().split('\n').filter((line) => line.startsWith(`${notAudio}:`))
    expect(lines).toEqual([expect.stringMatching(/^.*notes\.wav: upload refused: The file: /)])
  })

  it('lists every option with --help and says what a usage mistake is', async () => {
    const help = await runUploader(['--help'])
    expect(help.code).toBe(0)
    for (const option of ['--url', '--token', '--survey', '--kind', '--channel', '--source', '--receiver', '--sweep-f1', '--sweep-f2', '--sweep-seconds', '--reference', '--timeout', '--json', '--help', 'RINGDOWN_TOKEN', 'RINGDOWN_URL']) {
      expect(help.stdout).toContain(option)
    }
    const mistake = await runUploader(['--url', baseUrl, '--token', engineerToken, SMALL_ROOM])
    expect(mistake.code).toBe(2)
    expect(mistake.stderr.trim()).toBe('ringdown upload: --survey is missing (see --help)')
  })
})
