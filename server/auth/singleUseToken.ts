import { createHash, randomBytes } from 'node:crypto'

/** An unguessable token (32 random bytes, base64url) and the sha256 we store instead of it. */
export function createSingleUseToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url')
  return { token, tokenHash: hashToken(token) }
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex')
}
