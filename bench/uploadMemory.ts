import { spawn } from 'node:child_process'
import { randomFillSync } from 'node:crypto'
import { readFile } from 'node:fs/promises'
import http from 'node:http'
import { createServer, type AddressInfo } from 'node:net'
import { Readable } from 'node:stream'
import { performance } from 'node:perf_hooks'
import { startTestServices } from '../tests/helpers/testServices'
import { createWorkspaceFixture, FIXTURE_PASSWORD } from '../tests/helpers/workspaceFixture'

// Issue 16 figure: peak RSS of a real server process (`npm run serve`) while three 200 MB WAV
// uploads stream in at once (goal: under 400 MB; the version that read uploads into memory went
// from 193 MB to 1.2 GB). Needs the throw-away services scripts/bench.sh starts.

const UPLOAD_BYTES = Number(process.env.BENCH_UPLOAD_MB ?? 200) * 1024 * 1024
const PARALLEL = 3

async function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as AddressInfo
      probe.close(() => resolve(port))
    })
  })
}

/** A 16-bit mono 48 kHz WAV of `byteCount` bytes (noise: only its header is checked), made as it is read. */
function wavStream(byteCount: number): Readable {
  const dataBytes = byteCount - 44
  const header = Buffer.alloc(44)
  header.write('RIFF', 0, 'latin1')
  header.writeUInt32LE(byteCount - 8, 4)
  header.write('WAVEfmt ', 8, 'latin1')
  header.writeUInt32LE(16, 16)
  header.writeUInt16LE(1, 20) // PCM
  header.writeUInt16LE(1, 22)
  header.writeUInt32LE(48_000, 24)
  header.writeUInt32LE(96_000, 28)
  header.writeUInt16LE(2, 32)
  header.writeUInt16LE(16, 34)
  header.write('data', 36, 'latin1')
  header.writeUInt32LE(dataBytes, 40)
  let remaining = dataBytes
  let sentHeader = false
  return new Readable({
    read() {
      if (!sentHeader) {
        sentHeader = true
        this.push(header)
        return
      }
      if (remaining === 0) {
        this.push(null)
        return
      }
      const chunk = randomFillSync(Buffer.allocUnsafe(Math.min(256 * 1024, remaining)))
      remaining -= chunk.length
      this.push(chunk)
    },
  })
}

/** GET/POST with a cookie jar of one session. */
class Session {
  private cookie = ''
  csrf = ''
  constructor(private readonly baseUrl: string) {}

  async request(method: string, path: string, body?: unknown): Promise<{ status: number; json: unknown }> {
    const response = await fetch(`${this.baseUrl}${path}`, {
      method,
      headers: { cookie: this.cookie, 'x-csrf-token': this.csrf, ...(body ? { 'content-type': 'application/json' } : {}) },
      body: body ? JSON.stringify(body) : undefined,
    })
    const setCookie = response.headers.get('set-cookie')
    if (setCookie) this.cookie = setCookie.split(';')[0]!
    return { status: response.status, json: await response.json().catch(() => null) }
  }

  async signIn(email: string, password: string) {
    this.csrf = ((await this.request('GET', '/api/auth/csrf')).json as { csrfToken: string }).csrfToken
    const signIn = await this.request('POST', '/api/auth/sign-in', { email, password })
    if (signIn.status !== 200) throw new Error(`sign-in failed: ${signIn.status} ${JSON.stringify(signIn.json)}`)
    this.csrf = ((await this.request('GET', '/api/auth/csrf')).json as { csrfToken: string }).csrfToken
  }

  /** A multipart upload streamed in chunked encoding, as a browser sends a large file. */
  upload(path: string, byteCount: number): Promise<number> {
    const boundary = `ringdown-bench-${Math.random().toString(16).slice(2)}`
    const head = `--${boundary}\r\nContent-Disposition: form-data; name="kind"\r\n\r\nimpulse\r\n--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="long.wav"\r\nContent-Type: audio/wav\r\n\r\n`
    return new Promise((resolve, reject) => {
      const req = http.request(`${this.baseUrl}${path}`, {
        method: 'POST',
        headers: { cookie: this.cookie, 'x-csrf-token': this.csrf, 'content-type': `multipart/form-data; boundary=${boundary}` },
      })
      req.on('response', (response) => {
        response.resume()
        response.on('end', () => resolve(response.statusCode ?? 0))
      })
      req.on('error', reject)
      req.write(head)
      const body = wavStream(byteCount)
      body.pipe(req, { end: false })
      body.on('end', () => req.end(`\r\n--${boundary}--\r\n`))
    })
  }
}

async function rssMb(pid: number): Promise<{ rssMb: number; peakMb: number }> {
  const status = await readFile(`/proc/${pid}/status`, 'utf8')
  const field = (name: string) => Number(new RegExp(`${name}:\\s+(\\d+) kB`).exec(status)?.[1] ?? 0) / 1024
  return { rssMb: field('VmRSS'), peakMb: field('VmHWM') }
}

const services = await startTestServices({ UPLOAD_LIMIT_MB: 250 })
const fixture = await createWorkspaceFixture('UploadBench')
const port = await freePort()
const server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
  env: { ...process.env, S3_BUCKET: services.config.S3_BUCKET, PORT: String(port), HOST: '127.0.0.1', UPLOAD_LIMIT_MB: '250', FAKE_SMTP_PORT: '0', MAIL_DIR: `${process.env.RINGDOWN_DATA_DIR ?? '/tmp'}/bench-mail`, NODE_ENV: 'production', LOG_LEVEL: 'warn', SIGN_IN_RATE_LIMIT: '1000' },
  stdio: ['ignore', 'ignore', 'inherit'],
})
// The server is stopped however this script ends.
process.on('exit', () => server.kill('SIGKILL'))
const baseUrl = `http://127.0.0.1:${port}`
for (let tries = 0; ; tries++) {
  const answer = await fetch(`${baseUrl}/api/health`).then((r) => r.status, () => 0)
  if (answer > 0) break
  if (tries > 300) throw new Error('the server did not start')
  await new Promise((resolve) => setTimeout(resolve, 100))
}
const session = new Session(baseUrl)
await session.signIn(fixture.users.engineer.email, FIXTURE_PASSWORD)
await new Promise((resolve) => setTimeout(resolve, 1000))
const idle = await rssMb(server.pid!)

const ROUNDS = 3
const roundPeaksMb: number[] = []
const roundSeconds: number[] = []
for (let round = 0; round < ROUNDS; round++) {
  let sampledPeakMb = (await rssMb(server.pid!)).rssMb
  const sampler = setInterval(() => {
    rssMb(server.pid!).then((now) => { sampledPeakMb = Math.max(sampledPeakMb, now.rssMb) }, () => {})
  }, 50)
  const start = performance.now()
  const statuses = await Promise.all(Array.from({ length: PARALLEL }, () => session.upload(`/api/surveys/${fixture.sharedSurvey.id}/captures`, UPLOAD_BYTES)))
  roundSeconds.push((performance.now() - start) / 1000)
  clearInterval(sampler)
  if (statuses.some((status) => status !== 202)) throw new Error(`an upload was refused: ${statuses.join(', ')}`)
  roundPeaksMb.push(sampledPeakMb)
}
const after = await rssMb(server.pid!)
const median = (values: number[]) => [...values].sort((x, y) => x - y)[Math.floor(values.length / 2)]!

console.log(`${PARALLEL} parallel uploads of ${UPLOAD_BYTES / 1024 / 1024} MB, ${ROUNDS} rounds: median ${median(roundSeconds).toFixed(1)} s a round, ${((PARALLEL * UPLOAD_BYTES) / 1024 / 1024 / median(roundSeconds)).toFixed(0)} MB/s into the bucket`)
console.log(`server RSS: idle ${idle.rssMb.toFixed(0)} MB; peak while uploading median ${median(roundPeaksMb).toFixed(0)} MB (rounds ${roundPeaksMb.map((mb) => mb.toFixed(0)).join(', ')}; sampled every 50 ms); kernel high-water mark ${after.peakMb.toFixed(0)} MB; goal < 400 MB`)

await new Promise((resolve) => {
  server.once('exit', resolve)
  server.kill('SIGTERM')
})
await services.close()
