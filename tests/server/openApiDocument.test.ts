import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import express from 'express'
import request from 'supertest'
import { Validator } from '@seriousme/openapi-schema-validator'
import { createApp, type RingdownApp } from '../../server/app'
import { listMountedRoutes, routeKey } from '../../server/openapi/listMountedRoutes'
import { checkRouteDocs } from '../../server/openapi/checkRouteDocs'
import { startTestServices, type TestServices } from '../helpers/testServices'

let services: TestServices
let ringdown: RingdownApp
let document: { openapi: string; paths: Record<string, Record<string, { security?: unknown[]; parameters?: { name: string; in: string; required?: boolean }[]; requestBody?: { content: Record<string, unknown> } }>> }

beforeAll(async () => {
  services = await startTestServices()
  ringdown = createApp(services)
  const response = await request(ringdown.app).get('/api/openapi.json').expect(200)
  document = response.body
})
afterAll(async () => {
  await ringdown.close()
  await services.close()
})

const HOW_TO = 'Add an entry to the documentRoutes(...) call at the end of the route’s router file (DEVELOPERS.md, “Add a route”).'

function documentedOperations(): string[] {
  return Object.entries(document.paths).flatMap(([path, operations]) => Object.keys(operations).map((method) => `${method.toUpperCase()} ${path}`))
}

describe('GET /api/openapi.json', () => {
  it('is a valid OpenAPI 3.1 document', async () => {
    // The validator checks against the published OpenAPI 3.1 JSON Schema (spec.openapis.org/oas/3.1).
    const validator = new Validator()
    const result = await validator.validate(document as unknown as Parameters<Validator['validate']>[0])
    expect(result.errors ?? [], JSON.stringify(result.errors, null, 2)).toEqual([])
    expect(result.valid).toBe(true)
    expect(validator.version).toBe('3.1')
  })

  it('lists every route the Express routers mount, and nothing else', () => {
    const mounted = listMountedRoutes(ringdown.app).map(routeKey)
    // The walk over the routers must itself see the routes (else the comparison proves nothing).
    expect(mounted).toEqual(expect.arrayContaining(['POST /api/surveys/{surveyId}/captures', 'GET /api/captures/{captureId}', 'POST /api/tokens', 'GET /api/health']))
    const listed = documentedOperations()
    const missing = mounted.filter((key) => !listed.includes(key))
    const extra = listed.filter((key) => !mounted.includes(key))
    expect(missing, `Mounted but not in the API document:\n  ${missing.join('\n  ')}\n${HOW_TO}`).toEqual([])
    expect(extra, `In the API document but not mounted:\n  ${extra.join('\n  ')}`).toEqual([])
  })

  it('has no documentation entry left over for a route that no longer exists', () => {
    const { stale } = checkRouteDocs(ringdown.app)
    expect(stale, `Documented but not mounted (remove or correct the entry):\n  ${stale.join('\n  ')}`).toEqual([])
  })

  it('takes parameters and bodies from the routes’ zod schemas', () => {
    const comparison = document.paths['/api/rooms/{roomId}/comparison']!.get!
    expect(comparison.parameters).toEqual(expect.arrayContaining([
      expect.objectContaining({ name: 'roomId', in: 'path', required: true }),
      expect.objectContaining({ name: 'surveys', in: 'query', required: true }),
      expect.objectContaining({ name: 'bands', in: 'query', required: false }),
    ]))
    expect(Object.keys(document.paths['/api/surveys/{surveyId}/captures']!.post!.requestBody!.content)).toEqual(['multipart/form-data'])
    expect(Object.keys(document.paths['/api/rooms/{roomId}/surveys']!.post!.requestBody!.content)).toEqual(['application/json'])
  })

  it('says which routes take an API token, which need a browser session and which are public', () => {
    expect(document.paths['/api/captures/{captureId}']!.get!.security).toEqual([{ apiToken: [] }, { session: [] }])
    expect(document.paths['/api/tokens']!.post!.security).toEqual([{ session: [] }])
    expect(document.paths['/api/test-signal/sweep.wav']!.get!.security).toEqual([])
  })
})

describe('checkRouteDocs', () => {
  it('names a route that is mounted without documentation', () => {
    const app = express()
    const router = express.Router()
    router.get('/rooms/:roomId/pins', (_req, res) => res.json([]))
    app.use('/api', router)
    expect(checkRouteDocs(app).undocumented).toEqual(['GET /api/rooms/{roomId}/pins'])
  })
})
