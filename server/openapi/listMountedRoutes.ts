import type { Express } from 'express'
import type { ZodType } from 'zod'
import { requireAuth } from '../middleware/requireAuth'
import type { Schemas } from '../middleware/validate'

/** One route the Express app answers, as the API document names it. */
export interface MountedRoute {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete'
  /** OpenAPI form: `/api/surveys/{surveyId}/captures`. */
  path: string
  /** The schemas its validate() middleware checks. */
  schemas: Schemas
  requiresAuth: boolean
}

// The shapes of router@2 (Express 5) that we read: a layer holds a route or a nested router.
interface Layer {
  rawPath?: unknown
  handle: ((...args: unknown[]) => unknown) & { stack?: Layer[]; schemas?: Schemas }
  route?: { path: unknown; methods: Record<string, boolean>; stack: Layer[] }
}

const METHODS = ['get', 'post', 'put', 'patch', 'delete'] as const

function joinPaths(prefix: string, path: string): string {
  return `${prefix.replace(/\/$/, '')}/${path.replace(/^\//, '')}`.replace(/\/$/, '') || '/'
}

/** `/rooms/:roomId` → `/rooms/{roomId}`; other Express path syntax is not used by our routes. */
function toOpenApiPath(expressPath: string): string {
  if (/[*?(){}]/.test(expressPath)) throw new Error(`The route path ${expressPath} uses syntax the API document does not describe; use plain :params.`)
  return expressPath.replace(/:([A-Za-z0-9_]+)/g, '{$1}')
}

function collectSchemas(stack: Layer[]): Schemas {
  const schemas: Schemas = {}
  for (const layer of stack) {
    for (const part of ['params', 'query', 'body'] as const) {
      const schema: ZodType | undefined = layer.handle.schemas?.[part]
      if (schema) schemas[part] = schema
    }
  }
  return schemas
}

function walk(stack: Layer[], prefix: string, inheritsAuth: boolean, into: MountedRoute[]): void {
  let requiresAuth = inheritsAuth
  for (const layer of stack) {
    if (layer.route) {
      if (typeof layer.route.path !== 'string') continue
      const path = toOpenApiPath(joinPaths(prefix, layer.route.path))
      const routeAuth = requiresAuth || layer.route.stack.some((inner) => inner.handle === requireAuth)
      for (const method of METHODS) {
        if (layer.route.methods[method]) into.push({ method, path, schemas: collectSchemas(layer.route.stack), requiresAuth: routeAuth })
      }
    } else if (Array.isArray(layer.handle.stack) && typeof layer.rawPath === 'string') {
      walk(layer.handle.stack, joinPaths(prefix, layer.rawPath), requiresAuth, into)
    } else if (layer.handle === requireAuth) {
      // router.use(requireAuth): every later route of this router needs a signed-in caller.
      requiresAuth = true
    }
  }
}

/**
 * Every `/api` route the app mounts, read from its Express routers (not from a list kept by hand),
 * so the API document and its test see exactly what the server answers.
 */
export function listMountedRoutes(app: Express): MountedRoute[] {
  const routes: MountedRoute[] = []
  walk((app.router as unknown as { stack: Layer[] }).stack, '', false, routes)
  return routes.filter((route) => route.path.startsWith('/api/'))
}

export function routeKey(route: { method: string; path: string }): string {
  return `${route.method.toUpperCase()} ${route.path}`
}
