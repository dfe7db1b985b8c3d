import { ApiToken } from '../models'
import { HttpError } from '../errors'
import { hashToken } from './singleUseToken'
import { isApiTokenSecret } from './apiTokenSecret'
import type { TokenScope } from './actingScope'

/** Writing last-used on every request would turn polling into writes; once a minute is enough to read. */
const LAST_USED_RESOLUTION_MS = 60_000
const NEW_TOKEN_HINT = 'Create a new token on the Settings page.'

export class ApiTokenRefusedError extends HttpError {
  constructor(code: 'invalid-token' | 'token-expired' | 'token-revoked', message: string) {
    super(401, code, message)
  }
}

/** The scope of a valid, unexpired, unrevoked token; refuses anything else with a 401 that says why. */
export async function authenticateApiToken(secret: string, now = new Date()): Promise<TokenScope> {
  const token = isApiTokenSecret(secret) ? await ApiToken.findOne({ where: { tokenHash: hashToken(secret) } }) : null
  if (!token) throw new ApiTokenRefusedError('invalid-token', `That API token is not valid. ${NEW_TOKEN_HINT}`)
  if (token.revokedAt) {
    const why = token.revokedReason ? ` (${token.revokedReason})` : ''
    throw new ApiTokenRefusedError('token-revoked', `The API token "${token.name}" was revoked${why}. ${NEW_TOKEN_HINT}`)
  }
  if (token.expiresAt.getTime() <= now.getTime()) {
    throw new ApiTokenRefusedError('token-expired', `The API token "${token.name}" expired on ${token.expiresAt.toISOString().slice(0, 10)}. ${NEW_TOKEN_HINT}`)
  }
  if (!token.lastUsedAt || now.getTime() - token.lastUsedAt.getTime() >= LAST_USED_RESOLUTION_MS) {
    await ApiToken.update({ lastUsedAt: now }, { where: { id: token.id } })
  }
  return { tokenId: token.id, tokenName: token.name, userId: token.userId, workspaceId: token.workspaceId, role: token.role }
}
