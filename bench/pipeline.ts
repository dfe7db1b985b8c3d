import { spawn, type ChildProcess } from 'node:child_process'
import { mkdtemp, readFile, rm } from 'node:fs/promises'
import { createServer } from 'node:net'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { performance } from 'node:perf_hooks'
import { Queue } from 'bullmq'
import { Analysis } from '../server/models'
import { ANALYSIS_QUEUE_NAME } from '../shared/jobs/analysisJob'
import { startTestServices } from '../tests/helpers/testServices'
import { createWorkspaceFixture, FIXTURE_PASSWORD } from '../tests/helpers/workspaceFixture'
import { decayingNoiseWav } from '../tests/helpers/wavFixtures'
import { signInOverHttp } from '../tests/helpers/httpSession'

// Issue 13 figures: a real server process and 1, 2 and 4 real worker processes on the throw-away
// services scripts/bench.sh starts (this wipes that database). Printed, never asserted.
// - upload 202 → analysis done for a 5 s 48 kHz file, one worker, one capture at a time (median);
// - 100 captures queued while the queue is paused, then released: captures per second, and the
//   ratio to one worker;
// - peak resident memory (VmHWM) of the server and of the largest worker.

const CAPTURE_COUNT = 100
const WORKER_COUNTS = [1, 2, 4]
// The machine is shared: rounds interleave the worker counts so a burst of other load hits them
// alike, and the best round of each is printed beside the worst.
const ROUNDS = 2
const LATENCY_RUNS = 11

// Scratch folder for the server's fake mail inbox; the files themselves go to the bench's S3 fake.
const scratchDir = await mkdtemp(path.join(tmpdir(), 'ringdown-bench-'))
const services = await startTestServices()
const fixture = await createWorkspaceFixture('Bench')
const fileBytes = new Uint8Array(decayingNoiseWav({ sampleRateHz: 48_000, durationS: 5, t60S: 0.6 }))
const childEnv = { ...process.env, S3_BUCKET: services.config.S3_BUCKET, LOG_LEVEL: 'silent', NODE_ENV: 'production', SESSION_SECRET: 'bench-session-secret' }

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number }
      probe.close(() => resolve(port))
    })
    probe.on('error', reject)
  })
}

/** Peak resident set (VmHWM) of a process, MB (Linux /proc). */
async function peakRssMb(pid: number): Promise<number> {
  const status = await readFile(`/proc/${pid}/status`, 'utf8')
  const kb = Number(/VmHWM:\s+(\d+) kB/.exec(status)?.[1] ?? 'NaN')
  return kb / 1024
}

const children = new Set<ChildProcess>()
// A failed run must not leave a server or workers behind.
process.on('exit', () => {
  for (const child of children) child.kill('SIGKILL')
})
process.on('uncaughtException', (error) => {
  console.error(error)
  process.exit(1)
})

function startProcess(entry: string, env: NodeJS.ProcessEnv): ChildProcess {
  const child = spawn(process.execPath, ['--import', 'tsx', entry], { env, stdio: ['ignore', 'ignore', 'inherit'] })
  children.add(child)
  child.once('exit', () => children.delete(child))
  return child
}

async function stopProcesses(children: ChildProcess[]): Promise<void> {
  await Promise.all(children.map((child) => new Promise((resolve) => { child.once('exit', resolve); child.kill('SIGTERM') })))
}

async function waitUntil(probe: () => Promise<boolean>, pollMs: number, timeoutMs = 600_000): Promise<void> {
  const deadline = Date.now() + timeoutMs
  while (!(await probe())) {
    if (Date.now() > deadline) throw new Error('bench: timed out waiting')
    await new Promise((resolve) => setTimeout(resolve, pollMs))
  }
}

const port = await freePort()
const baseUrl = `http://127.0.0.1:${port}`
const server = startProcess('server/index.ts', { ...childEnv, PORT: String(port), HOST: '127.0.0.1', FAKE_SMTP_PORT: String(await freePort()), MAIL_DIR: path.join(scratchDir, 'mail') })
await waitUntil(async () => (await fetch(`${baseUrl}/api/health`).catch(() => null))?.status === 200, 100, 60_000)

const session = await signInOverHttp(baseUrl, fixture.users.engineer.email, FIXTURE_PASSWORD)

async function upload(): Promise<number> {
  const form = new FormData()
  form.set('kind', 'impulse')
  form.set('file', new Blob([fileBytes]), 'bench.wav')
  const response = await fetch(`${baseUrl}/api/surveys/${fixture.sharedSurvey.id}/captures`, { method: 'POST', headers: { cookie: session.cookie, 'x-csrf-token': session.csrfToken }, body: form })
  const body = (await response.json()) as { id: number }
  if (response.status !== 202) throw new Error(`bench: upload failed: ${response.status} ${JSON.stringify(body)}`)
  return body.id
}

const settled = (ids: number[]) => async () => (await Analysis.count({ where: { captureId: ids, status: ['done', 'failed'] } })) === ids.length
const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!

function startWorkers(count: number): ChildProcess[] {
  return Array.from({ length: count }, () => startProcess('worker/index.ts', childEnv))
}

/** Lets each worker connect and analyse a couple of captures first (module loading, JIT). */
async function warmUp(count: number): Promise<void> {
  const ids: number[] = []
  for (let i = 0; i < 2 * count; i++) ids.push(await upload())
  await waitUntil(settled(ids), 20)
}

// 1. Latency: one worker, one capture at a time.
let workers = startWorkers(1)
await warmUp(1)
const latenciesMs: number[] = []
for (let run = 0; run < LATENCY_RUNS; run++) {
  const start = performance.now()
  const id = await upload()
  await waitUntil(settled([id]), 5)
  latenciesMs.push(performance.now() - start)
}
await stopProcesses(workers)

// 2. Throughput: captures queued while the queue is paused, released at once to warm workers.
const controlQueue = new Queue(ANALYSIS_QUEUE_NAME, { connection: services.redis, prefix: services.config.QUEUE_PREFIX })
const throughput: { workers: number; seconds: number; perSecond: number; workerPeakMb: number }[] = []
for (const count of Array.from({ length: ROUNDS }, () => WORKER_COUNTS).flat()) {
  workers = startWorkers(count)
  await warmUp(count)
  await controlQueue.pause()
  const ids: number[] = []
  for (let i = 0; i < CAPTURE_COUNT; i++) ids.push(await upload())
  const start = performance.now()
  await controlQueue.resume()
  await waitUntil(settled(ids), 20)
  const seconds = (performance.now() - start) / 1000
  const failed = await Analysis.count({ where: { captureId: ids, status: 'failed' } })
  if (failed > 0) console.log(`warning: ${failed} of ${CAPTURE_COUNT} analyses failed with ${count} worker(s)`)
  const workerPeakMb = Math.max(...(await Promise.all(workers.map((w) => peakRssMb(w.pid!)))))
  throughput.push({ workers: count, seconds, perSecond: CAPTURE_COUNT / seconds, workerPeakMb })
  await stopProcesses(workers)
}
const serverPeakMb = await peakRssMb(server.pid!)

const roundsOf = (count: number) => throughput.filter((row) => row.workers === count)
const bestPerSecond = (count: number) => Math.max(...roundsOf(count).map((row) => row.perSecond))
const single = bestPerSecond(1)
console.log(`| worker processes | ${CAPTURE_COUNT} captures, best round (s) | captures/s, best (worst) of ${ROUNDS} | ratio to 1 worker, best rounds | peak RSS of one worker (MB) |`)
console.log('| --- | --- | --- | --- | --- |')
for (const count of WORKER_COUNTS) {
  const best = bestPerSecond(count)
  const worst = Math.min(...roundsOf(count).map((row) => row.perSecond))
  const peakMb = Math.max(...roundsOf(count).map((row) => row.workerPeakMb))
  console.log(`| ${count} | ${(CAPTURE_COUNT / best).toFixed(1)} | ${best.toFixed(2)} (${worst.toFixed(2)}) | ${(best / single).toFixed(2)}× | ${peakMb.toFixed(0)} |`)
}
console.log(`upload sent → analysis done, 5 s 48 kHz, 1 worker: median ${median(latenciesMs).toFixed(0)} ms (min ${Math.min(...latenciesMs).toFixed(0)}, max ${Math.max(...latenciesMs).toFixed(0)}, n = ${latenciesMs.length})`)
console.log(`peak RSS of the server process over the whole run: ${serverPeakMb.toFixed(0)} MB`)

await controlQueue.close()
await stopProcesses([server])
await services.close()
await rm(scratchDir, { recursive: true, force: true })
