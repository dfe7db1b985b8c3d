import type { RequestHandler, Request } from 'express'
import { UnauthenticatedError } from '../errors'

export const requireAuth: RequestHandler = (req, _res, next) => {
  if (!req.user) throw new UnauthenticatedError()
  next()
}

/** The signed-in user's id; only call behind requireAuth. */
export function currentUserId(req: Request): number {
  if (!req.user) throw new UnauthenticatedError()
  return req.user.id
}
