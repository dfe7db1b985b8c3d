import type { OpenApiDocument } from '@/apiReference/openApiOutline'
import { request } from './http'

/** The server's API document (the same JSON scripts read at /api/openapi.json). */
export function getOpenApiDocument(): Promise<OpenApiDocument> {
  return request<OpenApiDocument>('GET', '/openapi.json')
}
