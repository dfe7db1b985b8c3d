import { OpenAPIRegistry, OpenApiGeneratorV31, type ResponseConfig, type RouteConfig } from '@asteasolutions/zod-to-openapi'
import type { Express } from 'express'
import { z, type ZodObject } from 'zod'
import { listMountedRoutes, routeKey, type MountedRoute } from './listMountedRoutes'
import { documentedRoute, type DocumentedRoute } from './routeDocs'
import { errorResponseSchema } from './responseSchemas'
import { isSessionOnlyRoute } from '../middleware/apiTokenAuth'

const errorContent = { 'application/json': { schema: errorResponseSchema } }

function securityOf(route: MountedRoute): RouteConfig['security'] {
  if (!route.requiresAuth) return []
  if (isSessionOnlyRoute(route.method, route.path)) return [{ session: [] }]
  return [{ apiToken: [] }, { session: [] }]
}

function successResponse(doc: DocumentedRoute): ResponseConfig {
  const description = doc.responseDescription ?? doc.summary
  if (doc.contentType) return { description, content: { [doc.contentType]: { schema: { type: 'string' } } } }
  if (doc.response) return { description, content: { 'application/json': { schema: doc.response } } }
  return { description }
}

function responsesOf(route: MountedRoute, doc: DocumentedRoute): RouteConfig['responses'] {
  const responses: RouteConfig['responses'] = { [doc.status ?? 200]: successResponse(doc) }
  const error = (description: string) => ({ description, content: errorContent })
  if (route.schemas.body || route.schemas.query || route.schemas.params || doc.multipart) responses[400] = error('The request is not valid; `fields` names each bad field.')
  if (route.requiresAuth) {
    responses[401] = error('Not signed in, or the API token is unknown, expired or revoked.')
    responses[403] = error('The caller’s role (or the token’s role) does not allow this; or a cookie request without its CSRF token.')
  }
  if (route.path.includes('{')) responses[404] = error('No such record, or it belongs to a workspace the caller cannot see.')
  if (route.requiresAuth && !isSessionOnlyRoute(route.method, route.path)) responses[429] = error('The API token made too many requests this minute; wait for Retry-After.')
  return responses
}

function requestBodyOf(route: MountedRoute, doc: DocumentedRoute): NonNullable<RouteConfig['request']>['body'] {
  if (doc.multipart) {
    const files = Object.fromEntries(
      Object.entries(doc.multipart.files).map(([name, file]) => {
        const schema = z.string().meta({ contentMediaType: file.contentType, description: file.description })
        return [name, file.isRequired ? schema : schema.optional()]
      }),
    )
    const schema = z.object({ ...doc.multipart.fields.shape, ...files })
    return { required: true, content: { 'multipart/form-data': { schema } } }
  }
  if (!route.schemas.body) return undefined
  return { required: true, content: { 'application/json': { schema: route.schemas.body } } }
}

function registerRoute(registry: OpenAPIRegistry, route: MountedRoute, doc: DocumentedRoute): void {
  const description = doc.isDevelopmentOnly ? `${doc.description ?? ''}\n\nOnly on a development machine (no SMTP_URL, loopback address).`.trim() : doc.description
  registry.registerPath({
    method: route.method,
    path: route.path,
    tags: [doc.tag],
    summary: doc.summary,
    ...(description ? { description } : {}),
    security: securityOf(route),
    request: {
      ...(route.schemas.params ? { params: route.schemas.params as ZodObject } : {}),
      ...(route.schemas.query ? { query: route.schemas.query as ZodObject } : {}),
      ...(requestBodyOf(route, doc) ? { body: requestBodyOf(route, doc) } : {}),
    },
    responses: responsesOf(route, doc),
  })
}

const INTRODUCTION = [
  'The Ringdown API: rooms, surveys, captures, analyses (ISO 3382-1/-2 parameters), comparisons and reports.',
  '',
  'Scripts and measuring rigs authenticate with a personal API token (Settings → API tokens): send `Authorization: Bearer <token>`.',
  'A token reaches one workspace with at most its role; it needs no CSRF token. The browser uses a session cookie, and its',
  'changing requests send the `X-CSRF-Token` header from `GET /api/auth/csrf`.',
  '',
  'Records the caller cannot see answer 404, never 403. Errors are `{ "error": { "code", "message", "fields" } }`.',
].join('\n')

/**
 * The OpenAPI 3.1 document of the routes `app` mounts, with parameters and JSON bodies from their
 * zod schemas. Routes without an entry in routeDocs are left out (the document's test names them).
 */
export function buildOpenApiDocument(app: Express, version: string): ReturnType<OpenApiGeneratorV31['generateDocument']> {
  const registry = new OpenAPIRegistry()
  registry.registerComponent('securitySchemes', 'apiToken', { type: 'http', scheme: 'bearer', description: 'A personal API token, `rdt_…` (Settings → API tokens).' })
  registry.registerComponent('securitySchemes', 'session', { type: 'apiKey', in: 'cookie', name: 'ringdown.sid', description: 'The browser session; changing requests also send X-CSRF-Token.' })
  for (const route of listMountedRoutes(app)) {
    const doc = documentedRoute(routeKey(route))
    if (doc) registerRoute(registry, route, doc)
  }
  return new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: '3.1.0',
    info: { title: 'Ringdown API', version, description: INTRODUCTION },
    servers: [{ url: '/', description: 'This server' }],
  })
}
