import type { ObjectStore } from './createObjectStore'
import { sweepStorage } from './sweepStorage'
import { releaseQueuedContent } from './releaseContent'
import { logger } from '../logger'

/** Between full sweeps, queued releases are retried this often (a failed delete, another server's). */
const RELEASE_INTERVAL_MS = 60_000
/** Full sweeps (temporary objects, multipart uploads, unreferenced content) this often. */
const SWEEP_INTERVAL_MS = 15 * 60_000

/**
 * Runs a full storage sweep now (at server start) and on a timer, plus a short release pass
 * every minute. Every pass only logs its failures. `stop` clears the timers for shutdown.
 */
export function startStorageHousekeeping(store: ObjectStore): { stop: () => void } {
  const sweep = () => {
    sweepStorage(store)
      .then((report) => {
        const { temporaryObjectsRemoved, multipartUploadsAborted, unusedContentRemoved } = report
        if (temporaryObjectsRemoved + (multipartUploadsAborted ?? 0) + unusedContentRemoved > 0) logger.info(report, 'storage housekeeping removed leftovers')
      })
      .catch((error: unknown) => logger.warn({ err: error }, 'storage housekeeping failed'))
  }
  sweep()
  const sweepTimer = setInterval(sweep, SWEEP_INTERVAL_MS)
  const releaseTimer = setInterval(() => void releaseQueuedContent(store), RELEASE_INTERVAL_MS)
  sweepTimer.unref()
  releaseTimer.unref()
  return {
    stop: () => {
      clearInterval(sweepTimer)
      clearInterval(releaseTimer)
    },
  }
}
