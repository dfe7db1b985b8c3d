import { Router, type Express } from 'express'
import { buildOpenApiDocument } from '../openapi/buildOpenApiDocument'
import { documentRoutes } from '../openapi/routeDocs'
import '../openapi/appRouteDocs'

/** GET /api/openapi.json: built from the mounted routers on first request (all are mounted by then), then kept. */
export function openApiRouter(app: Express, version: string) {
  const router = Router()
  let document: ReturnType<typeof buildOpenApiDocument> | null = null
  router.get('/openapi.json', (_req, res) => {
    document ??= buildOpenApiDocument(app, version)
    res.json(document)
  })
  return router
}

documentRoutes('Reference', {
  'GET /api/openapi.json': { summary: 'This API document (OpenAPI 3.1)', responseDescription: 'The OpenAPI 3.1 document of every route.' },
})
