import { createHash } from 'node:crypto'
import type { Transaction } from 'sequelize'
import { contentKey } from './contentKeys'
import { contentDatabase, lockContent } from './contentReferences'
import type { ObjectStore } from './createObjectStore'

/**
 * Stores bytes made by the server itself (the demo scenario, test fixtures) as content and
 * returns their sha256. Call it inside the transaction that writes the rows naming the content,
 * so the lock keeps a concurrent release from removing it before they are committed (without
 * one it takes the lock only for the write: fine where nothing deletes at the same time).
 */
export async function storeContentBytes(store: ObjectStore, bytes: Uint8Array, transaction?: Transaction): Promise<string> {
  const sha256 = createHash('sha256').update(bytes).digest('hex')
  const write = async (held: Transaction) => {
    await lockContent([sha256], held)
    const key = contentKey(sha256)
    if ((await store.head(key))?.byteSize !== bytes.length) await store.putBytes(key, bytes, 'audio/wav')
  }
  await (transaction ? write(transaction) : contentDatabase().transaction(write))
  return sha256
}
