import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { spawn, execFileSync, type ChildProcess } from 'node:child_process'
import { mkdtempSync, chmodSync, rmSync } from 'node:fs'
import { connect } from 'node:net'
import { tmpdir } from 'node:os'
import path from 'node:path'

/**
 * The README's start command, run as a new user would: a fresh `git clone` of what is committed,
 * `npm start` with NODE_ENV=production already in the environment (the case that once skipped the
 * build's packages), then one signal to the npm process. A second start on the same data folder
 * must work without installing again. Ports come from TEST_START_PORT (four in a row).
 */
const basePort = Number(process.env.TEST_START_PORT ?? 56410)
const ports = { PORT: basePort, PG_PORT: basePort + 1, REDIS_PORT: basePort + 2, S3_PORT: basePort + 3 }
const baseUrl = `http://127.0.0.1:${ports.PORT}`
let cloneDir = ''
let dataDir = ''

/** The environment of a new user's shell: none of the test command's service settings. */
function newUserEnvironment(): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: 'production', RINGDOWN_DATA_DIR: dataDir }
  for (const name of ['DATABASE_URL', 'REDIS_URL', 'S3_ENDPOINT', 'S3_BUCKET', 'STORAGE_DIR', 'MAIL_DIR', 'SESSION_SECRET', 'REDIS_PERSIST', 'VITEST', 'VITEST_POOL_ID', 'VITEST_WORKER_ID']) delete env[name]
  for (const [name, value] of Object.entries(ports)) env[name] = String(value)
  return env
}

function startCommand(): { child: ChildProcess; exit: Promise<number | null>; output: () => string } {
  let output = ''
  const child = spawn('npm', ['start'], { cwd: cloneDir, env: newUserEnvironment(), stdio: ['ignore', 'pipe', 'pipe'] })
  child.stdout!.on('data', (chunk: Buffer) => { output += chunk.toString() })
  child.stderr!.on('data', (chunk: Buffer) => { output += chunk.toString() })
  const exit = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)))
  return { child, exit, output: () => output }
}

async function waitForHealth(exit: Promise<number | null>, output: () => string, limitMs: number): Promise<void> {
  const deadline = Date.now() + limitMs
  let exited = false
  void exit.then(() => { exited = true })
  while (Date.now() < deadline) {
    if (exited) throw new Error(`npm start exited before the server answered:\n${output().slice(-4000)}`)
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) return
    } catch { /* not listening yet */ }
    await new Promise((resolve) => setTimeout(resolve, 1000))
  }
  throw new Error(`The server did not answer /api/health within ${limitMs / 1000} s:\n${output().slice(-4000)}`)
}

function portIsClosed(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = connect(port, '127.0.0.1')
    socket.once('connect', () => { socket.destroy(); resolve(false) })
    socket.once('error', () => resolve(true))
  })
}

async function stopWith(signal: NodeJS.Signals, run: ReturnType<typeof startCommand>): Promise<number | null> {
  run.child.kill(signal)
  const code = await Promise.race([run.exit, new Promise<'timeout'>((resolve) => setTimeout(() => resolve('timeout'), 20_000))])
  if (code === 'timeout') throw new Error(`npm start was still running 20 s after ${signal}:\n${run.output().slice(-3000)}`)
  return code
}

beforeAll(() => {
  const root = path.resolve(__dirname, '../..')
  cloneDir = mkdtempSync(path.join(tmpdir(), 'ringdown-clone-'))
  execFileSync('git', ['clone', '--quiet', root, cloneDir])
  // The postgres user keeps its cluster under the data folder.
  dataDir = mkdtempSync(path.join(tmpdir(), 'ringdown-start-data-'))
  chmodSync(dataDir, 0o755)
})
afterAll(() => {
  rmSync(cloneDir, { recursive: true, force: true })
  rmSync(dataDir, { recursive: true, force: true })
})

describe('the start command from a fresh clone', () => {
  it('installs, builds and serves with NODE_ENV=production set, compresses the page, and stops every part on one SIGINT with exit 0', async () => {
    const run = startCommand()
    await waitForHealth(run.exit, run.output, 540_000)
    expect(run.output()).toContain('Ringdown is running')

    const page = await fetch(`${baseUrl}/`, { headers: { 'accept-encoding': 'gzip' } })
    expect(page.status).toBe(200)
    expect(page.headers.get('content-encoding')).toBe('gzip')
    // fetch decodes the body and keeps the header: the header proves the compression.
    expect(await page.text()).toContain('<div id="app"')

    const stopped = await stopWith('SIGINT', run)
    expect(stopped).toBe(0)
    for (const port of Object.values(ports)) expect(await portIsClosed(port), `port ${port} still open`).toBe(true)
  }, 600_000)

  it('starts a second time on the same data folder without reinstalling, and stops on one SIGTERM with exit 0', async () => {
    const run = startCommand()
    await waitForHealth(run.exit, run.output, 240_000)
    expect(run.output()).not.toContain('npm ci')
    const stopped = await stopWith('SIGTERM', run)
    expect(stopped).toBe(0)
    for (const port of Object.values(ports)) expect(await portIsClosed(port), `port ${port} still open`).toBe(true)
  }, 300_000)
})
