import { randomUUID } from 'node:crypto'

/** Prefix of finished content, one object per distinct file. */
export const CONTENT_PREFIX = 'content/'
/** Prefix of uploads still being checked; anything left here after a crash is removed at start. */
export const INCOMING_PREFIX = 'incoming/'

const SHA256_PATTERN = /^[0-9a-f]{64}$/

export function isSha256(value: string): boolean {
  return SHA256_PATTERN.test(value)
}

/**
 * Content-addressed key of a stored file: `content/ab/cd/<sha256>`. The two short levels keep
 * folder-backed servers (such as the local fake) from one huge directory.
 */
export function contentKey(sha256: string): string {
  if (!isSha256(sha256)) throw new Error('contentKey needs a lower-case hex sha256')
  return `${CONTENT_PREFIX}${sha256.slice(0, 2)}/${sha256.slice(2, 4)}/${sha256}`
}

/** The sha256 a content key names, or null for any other key. */
export function sha256OfContentKey(key: string): string | null {
  const sha256 = key.slice(key.lastIndexOf('/') + 1)
  return isSha256(sha256) && contentKey(sha256) === key ? sha256 : null
}

/** A fresh key for an upload whose content (and so its sha256) is not known yet. */
export function incomingKey(): string {
  return `${INCOMING_PREFIX}${randomUUID()}`
}
