import type { RingdownClient } from './ringdownClient'
import type { AnalysisDto, CaptureDto } from '../../shared/api/captures'

export type AnalysisOutcome =
  | { status: 'done'; analysis: AnalysisDto }
  | { status: 'failed'; message: string }
  | { status: 'timed-out'; message: string }

const FIRST_POLL_MS = 500
const LONGEST_POLL_MS = 3000

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms))

/**
 * Waits for a capture's analysis by polling `GET /api/captures/{id}` (status uploaded → queued →
 * analysing → done | failed), then reads `GET /api/captures/{id}/analysis`. The only place that
 * knows how the uploader learns of progress: switch it to server-sent events here when they exist.
 */
export async function waitForAnalysis(client: RingdownClient, captureId: number, options: { timeoutS: number; onStatus: (capture: CaptureDto) => void }): Promise<AnalysisOutcome> {
  const deadline = Date.now() + options.timeoutS * 1000
  let pollMs = FIRST_POLL_MS
  for (;;) {
    const capture = await client.getJson<CaptureDto>(`/api/captures/${captureId}`)
    options.onStatus(capture)
    if (capture.status === 'done') return { status: 'done', analysis: await client.getJson<AnalysisDto>(`/api/captures/${captureId}/analysis`) }
    if (capture.status === 'failed') return { status: 'failed', message: capture.statusMessage ?? 'the analysis failed' }
    if (Date.now() + pollMs > deadline) {
      return { status: 'timed-out', message: `still ${capture.status} after ${options.timeoutS} s; see capture ${captureId} in the browser later, or wait longer with --timeout` }
    }
    await sleep(pollMs)
    pollMs = Math.min(LONGEST_POLL_MS, Math.round(pollMs * 1.5))
  }
}
