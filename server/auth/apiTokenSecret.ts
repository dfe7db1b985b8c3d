import { randomBytes } from 'node:crypto'
import { hashToken } from './singleUseToken'

/** Secrets start with this, so people and secret scanners recognise a Ringdown token. */
export const API_TOKEN_PREFIX = 'rdt_'
/** How many leading characters of a secret are kept to tell tokens apart (prefix + 8). */
const SHOWN_CHARACTERS = API_TOKEN_PREFIX.length + 8

/** A new secret (32 random bytes), its sha256 for storage, and the short prefix shown in lists. */
export function createApiTokenSecret(): { secret: string; tokenHash: string; tokenPrefix: string } {
  const secret = `${API_TOKEN_PREFIX}${randomBytes(32).toString('base64url')}`
  return { secret, tokenHash: hashToken(secret), tokenPrefix: secret.slice(0, SHOWN_CHARACTERS) }
}

/** A well-formed secret: the prefix and 43 base64url characters. */
export function isApiTokenSecret(value: string): boolean {
  return /^rdt_[A-Za-z0-9_-]{43}$/.test(value)
}
