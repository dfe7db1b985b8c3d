import { QueryTypes } from 'sequelize'
import { contentKey } from './contentKeys'
import { contentDatabase, countContentReferences, lockContent } from './contentReferences'
import type { ObjectStore } from './createObjectStore'
import { logger } from '../logger'

/**
 * Removes the object of each content that no row names any more, deciding under the content's
 * lock so an upload writing a new reference at the same moment keeps it. Also clears the content
 * from the release queue. Returns the sha256s whose objects were removed.
 * @throws when the bucket refuses a delete (the queue entry stays for the next pass)
 */
export async function releaseContent(store: ObjectStore, sha256s: Iterable<string>): Promise<string[]> {
  const sequelize = contentDatabase()
  const removed: string[] = []
  for (const sha256 of new Set(sha256s)) {
    await sequelize.transaction(async (transaction) => {
      await lockContent([sha256], transaction)
      await sequelize.query('DELETE FROM content_releases WHERE sha256 = :sha256', { replacements: { sha256 }, transaction })
      if ((await countContentReferences(sha256, transaction)) > 0) return
      await store.remove([contentKey(sha256)])
      removed.push(sha256)
    })
  }
  return removed
}

/**
 * Works through the content queued by row deletes (the trigger of migration 0005), oldest first,
 * at most `batchSize` a call. Never throws: a content whose removal fails is logged and stays
 * queued for the next pass (the server runs one at start and every few minutes).
 * @returns how many objects were removed
 */
export async function releaseQueuedContent(store: ObjectStore, batchSize = 500): Promise<number> {
  try {
    const queued = await contentDatabase().query<{ sha256: string }>('SELECT sha256 FROM content_releases ORDER BY queued_at LIMIT :batchSize', { replacements: { batchSize }, type: QueryTypes.SELECT })
    let removedCount = 0
    for (const { sha256 } of queued) {
      try {
        removedCount += (await releaseContent(store, [sha256])).length
      } catch (error) {
        logger.warn({ err: error, sha256 }, 'could not remove unused stored content; will retry')
      }
    }
    return removedCount
  } catch (error) {
    logger.warn({ err: error }, 'could not read the content release queue; will retry')
    return 0
  }
}
