import { CONTENT_PREFIX, INCOMING_PREFIX, sha256OfContentKey } from './contentKeys'
import { referencedContent } from './contentReferences'
import type { ObjectStore } from './createObjectStore'
import { releaseContent, releaseQueuedContent } from './releaseContent'
import { logger } from '../logger'

/**
 * A live upload's temporary object exists only from the end of its transfer until its capture is
 * written (seconds), so one this old was left by a server that stopped in between. The same age
 * guards content written just before the row that names it.
 */
export const STALE_OBJECT_AGE_MS = 15 * 60_000
/** An open multipart upload this old was cut off (a 250 MB upload on a slow line takes minutes). */
export const STALE_MULTIPART_AGE_MS = 24 * 3600_000

export interface StorageSweepReport {
  temporaryObjectsRemoved: number
  /** null when the server cannot list multipart uploads (the local fake cleans its own at start). */
  multipartUploadsAborted: number | null
  unusedContentRemoved: number
}

/** Removes temporary upload objects older than {@link STALE_OBJECT_AGE_MS}. */
export async function removeStaleTemporaryObjects(store: ObjectStore, now: Date): Promise<number> {
  const cutoff = now.getTime() - STALE_OBJECT_AGE_MS
  const stale: string[] = []
  for await (const object of store.list(INCOMING_PREFIX)) if (object.lastModified.getTime() < cutoff) stale.push(object.key)
  await store.remove(stale)
  return stale.length
}

/**
 * Removes content objects no row names (left when a server stopped between a delete and the
 * object's removal, or by a failed upload), each re-checked under its lock before removal.
 */
export async function removeUnreferencedContent(store: ObjectStore, now: Date): Promise<number> {
  const cutoff = now.getTime() - STALE_OBJECT_AGE_MS
  const referenced = await referencedContent()
  const candidates: string[] = []
  for await (const object of store.list(CONTENT_PREFIX)) {
    const sha256 = sha256OfContentKey(object.key)
    if (sha256 && !referenced.has(sha256) && object.lastModified.getTime() < cutoff) candidates.push(sha256)
  }
  return (await releaseContent(store, candidates)).length
}

/**
 * The storage housekeeping the server runs at start and every few minutes: queued releases,
 * stale temporary uploads, cut-off multipart uploads and unreferenced content. Never throws; a
 * step that fails is logged and tried again next time.
 */
export async function sweepStorage(store: ObjectStore, options: { now?: Date; includeUnreferenced?: boolean } = {}): Promise<StorageSweepReport> {
  const now = options.now ?? new Date()
  const report: StorageSweepReport = { temporaryObjectsRemoved: 0, multipartUploadsAborted: null, unusedContentRemoved: 0 }
  const step = async (name: string, run: () => Promise<void>) => {
    try {
      await run()
    } catch (error) {
      logger.warn({ err: error, step: name }, 'storage housekeeping step failed; will retry')
    }
  }
  report.unusedContentRemoved += await releaseQueuedContent(store)
  await step('temporary objects', async () => { report.temporaryObjectsRemoved = await removeStaleTemporaryObjects(store, now) })
  await step('multipart uploads', async () => { report.multipartUploadsAborted = await store.abortMultipartUploads(INCOMING_PREFIX, new Date(now.getTime() - STALE_MULTIPART_AGE_MS)) })
  if (options.includeUnreferenced !== false) {
    await step('unreferenced content', async () => { report.unusedContentRemoved += await removeUnreferencedContent(store, now) })
  }
  return report
}
