import { describe, expect, it } from 'vitest'
import { describeNotes, describeType, outlineDocument, schemaRows, splitInlineCode, type OpenApiDocument } from '@/apiReference/openApiOutline'

const document: OpenApiDocument = {
  openapi: '3.1.0',
  info: { title: 'Test', version: '1' },
  components: {
    schemas: {
      Capture: { type: 'object', properties: { id: { type: 'integer' }, status: { type: 'string', enum: ['queued', 'done'] } }, required: ['id', 'status'] },
    },
  },
  paths: {
    '/api/surveys/{surveyId}/captures': {
      get: {
        tags: ['Captures'],
        summary: 'List',
        security: [{ apiToken: [] }, { session: [] }],
        parameters: [{ name: 'surveyId', in: 'path', required: true, schema: { type: 'integer', exclusiveMinimum: 0 } }],
        responses: { 200: { description: 'ok', content: { 'application/json': { schema: { type: 'array', items: { $ref: '#/components/schemas/Capture' } } } } } },
      },
      post: {
        tags: ['Captures'],
        summary: 'Upload',
        security: [{ apiToken: [] }],
        requestBody: { content: { 'multipart/form-data': { schema: { type: 'object', properties: { file: { type: 'string', contentMediaType: 'audio/wav' }, channel: { type: ['integer', 'null'], minimum: 0, default: 0 } }, required: ['file'] } } } },
        responses: { 202: { description: 'queued' } },
      },
    },
    '/api/tokens': { post: { tags: ['API tokens'], summary: 'Create', security: [{ session: [] }], responses: { 201: { description: 'created' } } } },
    '/api/health': { get: { tags: ['Service'], summary: 'Health', security: [], responses: { 200: { description: 'ok' } } } },
  },
}

describe('outlineDocument', () => {
  it('groups operations by tag in document order with their access', () => {
    const tags = outlineDocument(document)
    expect(tags.map((t) => t.tag)).toEqual(['Captures', 'API tokens', 'Service'])
    expect(tags[0]!.operations.map((o) => [o.method, o.auth])).toEqual([['GET', 'token-or-session'], ['POST', 'token-or-session']])
    expect(tags[1]!.operations[0]!.auth).toBe('session')
    expect(tags[2]!.operations[0]!.auth).toBe('public')
  })

  it('turns parameters, multipart fields and response bodies into readable rows', () => {
    const [list, upload] = outlineDocument(document)[0]!.operations
    expect(list!.parameters).toEqual([{ name: 'surveyId', location: 'path', type: 'integer', isRequired: true, notes: '> 0' }])
    expect(list!.responses).toEqual([{ status: '200', description: 'ok', body: 'array of Capture' }])
    expect(upload!.bodyMediaType).toBe('multipart/form-data')
    expect(upload!.bodyFields).toEqual([
      { name: 'file', location: null, type: 'file (audio/wav)', isRequired: true, notes: '' },
      { name: 'channel', location: null, type: 'integer or null', isRequired: false, notes: '≥ 0; default 0' },
    ])
  })
})

describe('schemaRows', () => {
  it('follows references and nests arrays of objects with a [] path', () => {
    const rows = schemaRows({ type: 'object', properties: { captures: { type: 'array', items: { $ref: '#/components/schemas/Capture' } } } }, document.components!.schemas!)
    expect(rows.map((r) => r.name)).toEqual(['captures', 'captures[].id', 'captures[].status'])
    expect(rows[2]!.type).toBe('one of queued, done')
  })
})

describe('describeType and describeNotes', () => {
  it('reads unions and limits', () => {
    expect(describeType({ anyOf: [{ type: 'string' }, { type: 'null' }] })).toBe('string or null')
    expect(describeType({ anyOf: [{ type: 'number', enum: [1] }, { type: 'number', enum: [3] }] })).toBe('one of 1, 3')
    expect(describeNotes({ minLength: 1, maxLength: 120, description: 'Name' })).toBe('Name; at least 1 character; at most 120 characters')
  })
})

describe('splitInlineCode', () => {
  it('marks backtick spans as code', () => {
    expect(splitInlineCode('Poll `GET /x` until `done`.')).toEqual([
      { text: 'Poll ', isCode: false }, { text: 'GET /x', isCode: true }, { text: ' until ', isCode: false }, { text: 'done', isCode: true }, { text: '.', isCode: false },
    ])
  })
})
