import type { Transaction } from 'sequelize'
import { contentKey } from './contentKeys'
import { contentDatabase, lockContent } from './contentReferences'
import type { ObjectStore } from './createObjectStore'
import type { IncomingUpload } from './incomingUploadStorage'
import { releaseContent } from './releaseContent'
import { logger } from '../logger'

/** Removes the temporary objects of an upload; a failure is only logged (the start-up sweep retries). */
export async function discardUploads(store: ObjectStore, uploads: (IncomingUpload | undefined)[]): Promise<void> {
  const keys = uploads.filter((upload): upload is IncomingUpload => upload !== undefined).map((upload) => upload.tempKey)
  if (keys.length === 0) return
  await store.remove(keys).catch((error: unknown) => logger.warn({ err: error, keys }, 'could not remove temporary uploads'))
}

/**
 * Turns checked uploads into stored content and writes the rows that point at it, as one step:
 * under the content locks, each content object is made to exist (a server-side copy of the
 * temporary object when it is new; an existing object with the same sha256 is reused), then
 * `writeRows` runs in the same transaction. If that fails, content copied here is released
 * again. The temporary objects are removed in every case.
 */
export async function commitUploads<T>(store: ObjectStore, uploads: IncomingUpload[], writeRows: (transaction: Transaction) => Promise<T>): Promise<T> {
  const copied: string[] = []
  try {
    return await contentDatabase().transaction(async (transaction) => {
      await lockContent(uploads.map((upload) => upload.sha256), transaction)
      for (const upload of uploads) {
        const key = contentKey(upload.sha256)
        const existing = await store.head(key)
        // Same sha256 means same bytes; a size that differs means a damaged object, so replace it.
        if (existing?.byteSize === upload.size) continue
        await store.copy(upload.tempKey, key)
        copied.push(upload.sha256)
      }
      return writeRows(transaction)
    })
  } catch (error) {
    await releaseContent(store, copied).catch((releaseError: unknown) => logger.warn({ err: releaseError, copied }, 'could not remove content of a failed upload'))
    throw error
  } finally {
    await discardUploads(store, uploads)
  }
}
