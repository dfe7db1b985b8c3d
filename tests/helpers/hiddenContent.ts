import type { ObjectStore } from '../../server/storage/createObjectStore'
import { contentKey } from '../../server/storage/contentKeys'

/**
 * Hides a stored file so the worker's read fails (moved to a key outside the content prefix),
 * runs the task, and gives the file back afterwards.
 */
export async function withoutStoredContent<T>(store: ObjectStore, sha256: string, task: () => Promise<T>): Promise<T> {
  const key = contentKey(sha256)
  const hidden = `test-hidden/${sha256}`
  await store.copy(key, hidden)
  await store.remove([key])
  try {
    return await task()
  } finally {
    await store.copy(hidden, key)
    await store.remove([hidden])
  }
}
