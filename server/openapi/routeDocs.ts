import type { ZodObject, ZodType } from 'zod'

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE'
/** `METHOD /api/path/{param}`, exactly as the API document and its test name the route. */
export type RouteKey = `${Method} /api/${string}`

/** What a person reads about one route; its params, query and JSON body come from its validate() schemas. */
export interface RouteDoc {
  summary: string
  description?: string
  /** The success status; 200 unless given. */
  status?: number
  /** JSON schema of the success body; without it the response is described in words only. */
  response?: ZodType
  /** What the success body is, in words (defaults to the summary). */
  responseDescription?: string
  /** A body that is not JSON, e.g. `text/csv` or `application/pdf`. */
  contentType?: string
  /** A multipart form: its text fields (a zod object) and its file fields. */
  multipart?: { fields: ZodObject; files: Record<string, { description: string; contentType: string; isRequired: boolean }> }
  /** Routes mounted only on a development machine say so. */
  isDevelopmentOnly?: boolean
}

export interface DocumentedRoute extends RouteDoc {
  tag: string
}

const documented = new Map<RouteKey, DocumentedRoute>()

/**
 * Documents the routes of one router for /api/openapi.json. Call it once at the end of the router
 * file, with one entry per route; tests/server/openApiDocument.test.ts fails, naming the route,
 * when a mounted route has no entry or an entry names no mounted route.
 */
export function documentRoutes(tag: string, docs: Partial<Record<RouteKey, RouteDoc>>): void {
  for (const [key, doc] of Object.entries(docs) as [RouteKey, RouteDoc][]) {
    if (documented.has(key)) throw new Error(`${key} is documented twice (second time under "${tag}").`)
    documented.set(key, { ...doc, tag })
  }
}

export function documentedRoute(key: string): DocumentedRoute | undefined {
  return documented.get(key as RouteKey)
}

export function documentedRouteKeys(): string[] {
  return [...documented.keys()]
}
