import { spawn, type ChildProcess } from 'node:child_process'
import { performance } from 'node:perf_hooks'
import { Op } from 'sequelize'
import { Queue } from 'bullmq'
import { ANALYSIS_QUEUE_NAME } from '../shared/jobs/analysisJob'
import { createApp } from '../server/app'
import { Capture } from '../server/models'
import { startTestServices } from '../tests/helpers/testServices'
import { signedInAgent, type ApiAgent } from '../tests/helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD } from '../tests/helpers/workspaceFixture'
import { decayingNoiseWav } from '../tests/helpers/wavFixtures'

// Issue 4 figures: time from the upload's 202 to "done" for a 5 s 48 kHz file (median of 10), and
// the throughput of 50 queued captures with one and with two worker processes. Needs the
// throw-away services scripts/bench.sh starts (it wipes that database).

const services = await startTestServices()
const ringdown = createApp(services)
const fixture = await createWorkspaceFixture('Bench')
const engineer = await signedInAgent(ringdown.app, fixture.users.engineer.email, FIXTURE_PASSWORD)
const fileBytes = Buffer.from(decayingNoiseWav({ sampleRateHz: 48_000, durationS: 5, t60S: 0.6 }))

function startWorkers(count: number): ChildProcess[] {
  return Array.from({ length: count }, () =>
    spawn(process.execPath, ['--import', 'tsx', 'worker/index.ts'], { env: { ...process.env, S3_BUCKET: services.config.S3_BUCKET, LOG_LEVEL: 'silent' }, stdio: 'ignore' }),
  )
}

async function stopWorkers(workers: ChildProcess[]) {
  await Promise.all(workers.map((w) => new Promise((resolve) => { w.once('exit', resolve); w.kill('SIGTERM') })))
}

async function upload(agent: ApiAgent): Promise<number> {
  const token = await agent.refreshCsrf()
  const response = await agent.agent.post(`/api/surveys/${fixture.sharedSurvey.id}/captures`).set('x-csrf-token', token).field('kind', 'impulse').attach('file', fileBytes, 'bench.wav')
  if (response.status !== 202) throw new Error(`upload failed: ${response.status} ${JSON.stringify(response.body)}`)
  return response.body.id as number
}

async function waitUntilDone(ids: number[], pollMs: number) {
  for (;;) {
    const pending = await Capture.count({ where: { id: ids, status: { [Op.notIn]: ['done', 'failed'] } } })
    if (pending === 0) return
    await new Promise((resolve) => setTimeout(resolve, pollMs))
  }
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!
const warmUpMs = 4000

// 1. Latency, one worker, one capture at a time.
let workers = startWorkers(1)
await new Promise((resolve) => setTimeout(resolve, warmUpMs))
const latenciesMs: number[] = []
for (let run = 0; run < 11; run++) {
  const id = await upload(engineer)
  const start = performance.now()
  await waitUntilDone([id], 5)
  if (run > 0) latenciesMs.push(performance.now() - start) // the first run warms the worker's JIT
}
await stopWorkers(workers)
console.log(`upload 202 → analysis done, 5 s 48 kHz, 1 worker: median ${median(latenciesMs).toFixed(0)} ms (min ${Math.min(...latenciesMs).toFixed(0)}, max ${Math.max(...latenciesMs).toFixed(0)}, n = ${latenciesMs.length})`)

// 2. Throughput of 50 queued captures: uploaded while the queue is paused, so the figure is the
// workers' rate alone, then released at once to warmed-up workers.
const controlQueue = new Queue(ANALYSIS_QUEUE_NAME, { connection: services.redis })
for (const workerCount of [1, 2]) {
  workers = startWorkers(workerCount)
  await new Promise((resolve) => setTimeout(resolve, warmUpMs))
  await controlQueue.pause()
  const ids: number[] = []
  for (let i = 0; i < 50; i++) ids.push(await upload(engineer))
  const start = performance.now()
  await controlQueue.resume()
  await waitUntilDone(ids, 20)
  const seconds = (performance.now() - start) / 1000
  console.log(`50 queued captures, ${workerCount} worker process(es): ${seconds.toFixed(1)} s, ${(50 / seconds).toFixed(2)} captures/s`)
  await stopWorkers(workers)
}

await controlQueue.close()
await ringdown.close()
await services.close()
