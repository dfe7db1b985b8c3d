// Runs the server and the worker as children of the start command. A part that exits on its own
// is restarted with a doubling back-off (logged) while the other keeps running; SIGINT/SIGTERM
// stops the server first, then the worker, and exits 0. Prints the ready banner only once
// /api/health answers.
import { spawn } from 'node:child_process'

const port = process.env.PORT ?? '3000'
const healthUrl = `http://127.0.0.1:${port}/api/health`
const parts = [
  { name: 'server', script: 'server/index.ts', child: null, failures: 0, startedAt: 0, stopWithinMs: 8000 },
  { name: 'worker', script: 'worker/index.ts', child: null, failures: 0, startedAt: 0, stopWithinMs: 10000 },
]
let stopping = false

function start(part) {
  part.startedAt = Date.now()
  part.child = spawn(process.execPath, ['--import', 'tsx', part.script], { stdio: 'inherit' })
  part.child.on('exit', (code, signal) => {
    part.child = null
    if (stopping) return
    // A part that ran a minute is healthy again: its back-off starts from one second.
    if (Date.now() - part.startedAt > 60_000) part.failures = 0
    const delayMs = Math.min(30_000, 1000 * 2 ** part.failures++)
    console.error(`ringdown: the ${part.name} exited (${signal ?? `code ${code}`}); restarting in ${delayMs / 1000} s`)
    setTimeout(() => { if (!stopping) start(part) }, delayMs)
  })
}

function stopPart(part) {
  return new Promise((resolve) => {
    const child = part.child
    if (!child) return resolve()
    const timer = setTimeout(() => child.kill('SIGKILL'), part.stopWithinMs)
    child.once('exit', () => { clearTimeout(timer); resolve() })
    child.kill('SIGTERM')
  })
}

async function shutdown() {
  if (stopping) return
  stopping = true
  for (const part of parts) await stopPart(part)
  process.exit(0)
}
process.on('SIGINT', () => void shutdown())
process.on('SIGTERM', () => void shutdown())

async function waitForHealth() {
  for (;;) {
    if (stopping) return
    try {
      const response = await fetch(healthUrl, { signal: AbortSignal.timeout(3000) })
      if (response.ok) return
    } catch { /* not listening yet */ }
    await new Promise((resolve) => setTimeout(resolve, 250))
  }
}

for (const part of parts) start(part)
await waitForHealth()
if (!stopping) console.log(process.env.RINGDOWN_READY_BANNER ?? `ringdown: running at http://127.0.0.1:${port}/`)
