/** The parts of an OpenAPI 3.1 document the reference page shows. */
export interface SchemaObject {
  $ref?: string
  type?: string | string[]
  properties?: Record<string, SchemaObject>
  required?: string[]
  items?: SchemaObject
  enum?: unknown[]
  anyOf?: SchemaObject[]
  oneOf?: SchemaObject[]
  description?: string
  format?: string
  contentMediaType?: string
  pattern?: string
  minimum?: number
  maximum?: number
  exclusiveMinimum?: number
  minLength?: number
  maxLength?: number
  minItems?: number
  maxItems?: number
  default?: unknown
}

interface ParameterObject {
  name: string
  in: string
  required?: boolean
  schema?: SchemaObject
  description?: string
}

interface MediaTypeObject {
  schema?: SchemaObject
}

interface OperationObject {
  tags?: string[]
  summary?: string
  description?: string
  security?: Record<string, string[]>[]
  parameters?: ParameterObject[]
  requestBody?: { content: Record<string, MediaTypeObject> }
  responses: Record<string, { description?: string; content?: Record<string, MediaTypeObject> }>
}

export interface OpenApiDocument {
  openapi: string
  info: { title: string; version: string; description?: string }
  paths: Record<string, Record<string, OperationObject>>
  components?: { schemas?: Record<string, SchemaObject> }
}

export interface FieldRow {
  /** Dotted for nested fields: `result.bands[].T30`. */
  name: string
  /** path, query, or null for body fields. */
  location: string | null
  type: string
  isRequired: boolean
  notes: string
}

export type OperationAuth = 'public' | 'token-or-session' | 'session'

export interface OperationOutline {
  /** Stable anchor id, e.g. `post-api-surveys-surveyid-captures`. */
  id: string
  method: string
  path: string
  summary: string
  description: string | null
  auth: OperationAuth
  parameters: FieldRow[]
  bodyMediaType: string | null
  bodyFields: FieldRow[]
  responses: { status: string; description: string; body: string | null }[]
}

export interface TagOutline {
  tag: string
  operations: OperationOutline[]
}

type Schemas = Record<string, SchemaObject>

const MAX_DEPTH = 3

function refName(ref: string): string {
  return ref.split('/').pop() ?? ref
}

function resolve(schema: SchemaObject, schemas: Schemas): SchemaObject {
  return schema.$ref ? (schemas[refName(schema.$ref)] ?? {}) : schema
}

/** A short type name a person reads: `integer`, `number or null`, `array of Capture`, `one of octave, third`. */
export function describeType(schema: SchemaObject): string {
  if (schema.$ref) return refName(schema.$ref)
  if (schema.enum) return `one of ${schema.enum.map(String).join(', ')}`
  const variants = schema.anyOf ?? schema.oneOf
  // A union of single values (zod literals) reads as one list: `one of 1, 3, 6`.
  if (variants?.every((variant) => variant.enum?.length === 1)) return `one of ${variants.map((variant) => String(variant.enum![0])).join(', ')}`
  if (variants) return variants.map(describeType).join(' or ')
  if (schema.type === 'array' && schema.items) return `array of ${describeType(schema.items)}`
  if (schema.contentMediaType) return `file (${schema.contentMediaType})`
  const types = Array.isArray(schema.type) ? schema.type : schema.type ? [schema.type] : []
  return types.length > 0 ? types.join(' or ') : 'any'
}

/** Limits, format, default and description as one line. */
export function describeNotes(schema: SchemaObject): string {
  const notes: string[] = []
  if (schema.description) notes.push(schema.description)
  if (schema.format) notes.push(schema.format)
  if (schema.minimum !== undefined) notes.push(`≥ ${schema.minimum}`)
  if (schema.exclusiveMinimum !== undefined) notes.push(`> ${schema.exclusiveMinimum}`)
  if (schema.maximum !== undefined) notes.push(`≤ ${schema.maximum}`)
  const characters = (count: number) => `${count} character${count === 1 ? '' : 's'}`
  if (schema.minLength !== undefined) notes.push(`at least ${characters(schema.minLength)}`)
  if (schema.maxLength !== undefined) notes.push(`at most ${characters(schema.maxLength)}`)
  if (schema.minItems !== undefined) notes.push(`at least ${schema.minItems} items`)
  if (schema.maxItems !== undefined) notes.push(`at most ${schema.maxItems} items`)
  if (schema.pattern) notes.push(`matches ${schema.pattern}`)
  if (schema.default !== undefined) notes.push(`default ${JSON.stringify(schema.default)}`)
  return notes.join('; ')
}

/** The fields of an object schema as rows, nested objects (and arrays of them) one level per depth. */
export function schemaRows(schema: SchemaObject, schemas: Schemas, prefix = '', depth = 0): FieldRow[] {
  const resolved = resolve(schema, schemas)
  const required = new Set(resolved.required ?? [])
  const rows: FieldRow[] = []
  for (const [name, field] of Object.entries(resolved.properties ?? {})) {
    const fullName = `${prefix}${name}`
    rows.push({ name: fullName, location: null, type: describeType(field), isRequired: required.has(name), notes: describeNotes(field) })
    if (depth + 1 >= MAX_DEPTH) continue
    const inner = resolve(field, schemas)
    if (inner.properties) rows.push(...schemaRows(inner, schemas, `${fullName}.`, depth + 1))
    else if (inner.type === 'array' && inner.items && resolve(inner.items, schemas).properties) rows.push(...schemaRows(inner.items, schemas, `${fullName}[].`, depth + 1))
  }
  return rows
}

function authOf(operation: OperationObject): OperationAuth {
  const schemes = (operation.security ?? []).flatMap((requirement) => Object.keys(requirement))
  if (schemes.length === 0) return 'public'
  return schemes.includes('apiToken') ? 'token-or-session' : 'session'
}

function bodyName(content: Record<string, MediaTypeObject> | undefined): string | null {
  if (!content) return null
  const [mediaType, media] = Object.entries(content)[0] ?? []
  if (!mediaType) return null
  return media?.schema && mediaType === 'application/json' ? describeType(media.schema) : mediaType
}

function outlineOperation(method: string, path: string, operation: OperationObject, schemas: Schemas): OperationOutline {
  const [bodyMediaType, body] = Object.entries(operation.requestBody?.content ?? {})[0] ?? [null, null]
  return {
    id: `${method}-${path}`.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/-+$/, ''),
    method: method.toUpperCase(),
    path,
    summary: operation.summary ?? '',
    description: operation.description ?? null,
    auth: authOf(operation),
    parameters: (operation.parameters ?? []).map((p) => ({
      name: p.name, location: p.in, type: p.schema ? describeType(p.schema) : 'any', isRequired: p.required ?? false,
      notes: [p.description, p.schema ? describeNotes(p.schema) : ''].filter(Boolean).join('; '),
    })),
    bodyMediaType: bodyMediaType ?? null,
    bodyFields: body?.schema ? schemaRows(body.schema, schemas) : [],
    responses: Object.entries(operation.responses).map(([status, response]) => ({ status, description: response.description ?? '', body: bodyName(response.content) })),
  }
}

/** Operations grouped by tag in the document's order, each with readable parameter and field rows. */
export function outlineDocument(document: OpenApiDocument): TagOutline[] {
  const schemas = document.components?.schemas ?? {}
  const byTag = new Map<string, OperationOutline[]>()
  for (const [path, operations] of Object.entries(document.paths)) {
    for (const [method, operation] of Object.entries(operations)) {
      const tag = operation.tags?.[0] ?? 'Other'
      byTag.set(tag, [...(byTag.get(tag) ?? []), outlineOperation(method, path, operation, schemas)])
    }
  }
  return [...byTag.entries()].map(([tag, operations]) => ({ tag, operations }))
}

/** Text with `backtick` spans (as the document's descriptions use them) → plain and code segments. */
export function splitInlineCode(text: string): { text: string; isCode: boolean }[] {
  return text.split('`').map((part, index) => ({ text: part, isCode: index % 2 === 1 })).filter((segment) => segment.text.length > 0)
}
