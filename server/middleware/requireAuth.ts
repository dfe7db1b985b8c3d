import type { RequestHandler, Request } from 'express'
import { UnauthenticatedError } from '../errors'
import { pinActingScope } from '../auth/actingScope'

export const requireAuth: RequestHandler = (req, _res, next) => {
  if (!req.user) throw new UnauthenticatedError()
  next()
}

/**
 * The signed-in user's id; only call behind requireAuth. It also pins the request's API-token
 * scope (or none) for the service call that follows, so every service sees the right limits.
 */
export function currentUserId(req: Request): number {
  if (!req.user) throw new UnauthenticatedError()
  pinActingScope(req.user.tokenScope ?? null)
  return req.user.id
}
