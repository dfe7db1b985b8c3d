import { loadCaptureViews } from '../../server/services/captureStates'
import type { CaptureStatus } from '../../shared/jobs/analysisJob'

/** A capture's derived state, as the API reports it. */
export async function captureStatusOf(captureId: number): Promise<CaptureStatus> {
  return (await loadCaptureViews([{ id: captureId }])).get(captureId)!.state.status
}

/** Waits (polling the database) until the capture's state is one of `statuses`; throws on timeout. */
export async function waitForCaptureStatus(captureId: number, statuses: readonly CaptureStatus[], timeoutMs = 60_000, pollMs = 50): Promise<CaptureStatus> {
  const deadline = Date.now() + timeoutMs
  for (;;) {
    const status = await captureStatusOf(captureId)
    if (statuses.includes(status)) return status
    if (Date.now() > deadline) throw new Error(`capture ${captureId} stuck in ${status}`)
    await new Promise((resolve) => setTimeout(resolve, pollMs))
  }
}
