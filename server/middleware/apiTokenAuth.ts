import type { Request, RequestHandler, Response } from 'express'
import { rateLimit, type RateLimitInfo } from 'express-rate-limit'
import { HttpError } from '../errors'
import { pinActingScope, type TokenScope } from '../auth/actingScope'
import { ApiTokenRefusedError, authenticateApiToken } from '../auth/authenticateApiToken'
import { recordActivity } from '../services/activityService'

/**
 * Routes an API token may not use: they manage the person's account, sign-in or tokens, and need
 * the person at a browser. Paths are relative to /api. The API document marks them session-only.
 */
const SESSION_ONLY_ROUTES: { method?: string; path: RegExp }[] = [
  { path: /^\/tokens(\/|$)/ },
  { path: /^\/auth(\/|$)/ },
  { method: 'POST', path: /^\/invitations\/[^/]+\/accept$/ },
]

/** Whether `METHOD /api/...` is refused to API tokens (the API document reads this too). */
export function isSessionOnlyRoute(method: string, apiPath: string): boolean {
  const path = apiPath.replace(/^\/api/, '')
  if (method.toUpperCase() === 'GET' && path === '/auth/me') return false
  return SESSION_ONLY_ROUTES.some((route) => (!route.method || route.method === method.toUpperCase()) && route.path.test(path))
}

function tokenScopeOf(req: Request): TokenScope | undefined {
  return req.user?.tokenScope
}

function refuse(res: Response, error: HttpError): never {
  // RFC 6750 §3: a refused bearer credential says so in WWW-Authenticate.
  res.set('WWW-Authenticate', `Bearer realm="ringdown", error="invalid_token", error_description="${error.message.replace(/"/g, "'")}"`)
  throw error
}

/** `Authorization: Bearer <token>` → the token's user and scope on the request; no header → untouched. */
const authenticate: RequestHandler = async (req, res, next) => {
  const header = req.headers.authorization
  // A fresh scope per request: nothing of an earlier request on the same connection carries over.
  pinActingScope(null)
  if (header === undefined) return next()
  const match = /^Bearer\s+(\S+)\s*$/i.exec(header)
  if (!match) refuse(res, new ApiTokenRefusedError('invalid-token', 'Send the API token as "Authorization: Bearer <token>".'))
  try {
    const scope = await authenticateApiToken(match[1]!)
    req.user = { id: scope.userId, tokenScope: scope }
    pinActingScope(scope)
  } catch (error) {
    if (error instanceof ApiTokenRefusedError) refuse(res, error)
    throw error
  }
  next()
}

const refuseSessionOnlyRoutes: RequestHandler = (req, _res, next) => {
  if (tokenScopeOf(req) && isSessionOnlyRoute(req.method, req.originalUrl.split('?')[0]!)) {
    throw new HttpError(403, 'session-only', 'This needs a person signed in at the web page; an API token cannot do it.')
  }
  next()
}

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS'])

/**
 * The token's own audit trail: every request that changes something and every refused one. Reads
 * that succeed only move the token's last-used time, so polling does not flood the trail.
 */
const auditTokenRequests: RequestHandler = (req, res, next) => {
  const scope = tokenScopeOf(req)
  if (scope) {
    res.on('finish', () => {
      if (SAFE_METHODS.has(req.method) && res.statusCode < 400) return
      if (res.statusCode === 429) return
      const path = req.originalUrl.split('?')[0]!.slice(0, 300)
      void recordActivity({ workspaceId: scope.workspaceId, roomId: null, userId: scope.userId, apiTokenId: scope.tokenId, action: 'api-token.request', summary: `${req.method} ${path} → ${res.statusCode}` })
    })
  }
  next()
}

function perTokenRateLimit(requestsPerMinute: number): RequestHandler {
  return rateLimit({
    windowMs: 60_000,
    limit: requestsPerMinute,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skip: (req) => !tokenScopeOf(req),
    keyGenerator: (req) => `api-token:${tokenScopeOf(req)!.tokenId}`,
    handler: (req, _res, next) => {
      const scope = tokenScopeOf(req)!
      // One line per window in the trail, not one per refused request.
      if ((req as Request & { rateLimit?: RateLimitInfo }).rateLimit?.used === requestsPerMinute + 1) {
        void recordActivity({ workspaceId: scope.workspaceId, roomId: null, userId: scope.userId, apiTokenId: scope.tokenId, action: 'api-token.rate-limited', summary: `went over ${requestsPerMinute} requests a minute; further requests wait` })
      }
      next(new HttpError(429, 'rate-limited', `This API token made more than ${requestsPerMinute} requests in a minute. Wait for the time in the Retry-After header and try again.`))
    },
  })
}

/**
 * Bearer-token authentication for /api, as one middleware chain for app.ts: authenticate, refuse
 * session-only routes, rate-limit per token, audit. Mount it after the session middleware (a token
 * wins over a cookie) and before CSRF protection, which {@link exceptApiTokenRequests} skips for tokens.
 */
export function apiTokenAuthentication(options: { requestsPerMinute: number }): RequestHandler[] {
  return [authenticate, refuseSessionOnlyRoutes, perTokenRateLimit(options.requestsPerMinute), auditTokenRequests]
}

/**
 * CSRF protects cookie sessions: a browser sends cookies on its own, but never an Authorization
 * header another site chose, so token requests need no CSRF token.
 */
export function exceptApiTokenRequests(middleware: RequestHandler): RequestHandler {
  return (req, res, next) => (tokenScopeOf(req) ? next() : middleware(req, res, next))
}
