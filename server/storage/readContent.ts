import { contentKey } from './contentKeys'
import type { ObjectStore } from './createObjectStore'

/**
 * The stored file of a sha256, streamed from the bucket into one buffer of its size (no second
 * copy while it arrives); the decoder needs the whole file.
 * @throws ObjectNotFoundError when the bucket does not hold it
 */
export async function readContent(store: ObjectStore, sha256: string): Promise<Uint8Array> {
  const { body, byteSize } = await store.getStream(contentKey(sha256))
  const bytes = new Uint8Array(byteSize)
  let offset = 0
  for await (const chunk of body as AsyncIterable<Buffer>) {
    if (offset + chunk.length > byteSize) throw new Error(`Stored content ${sha256} is longer than its declared ${byteSize} bytes.`)
    bytes.set(chunk, offset)
    offset += chunk.length
  }
  if (offset !== byteSize) throw new Error(`Stored content ${sha256} ended after ${offset} of ${byteSize} bytes.`)
  return bytes
}
