import type { RequestHandler } from 'express'
import type { ZodType } from 'zod'
import { ValidationError } from '../errors'

export interface Schemas {
  body?: ZodType
  params?: ZodType
  query?: ZodType
}

function fieldsOf(issues: { path: PropertyKey[]; message: string }[]): Record<string, string> {
  const fields: Record<string, string> = {}
  for (const issue of issues) {
    const key = issue.path.map(String).join('.') || '_'
    fields[key] ??= issue.message
  }
  return fields
}

/**
 * Validates body, params and query with zod and replaces them with the parsed values.
 * Express 5 exposes `req.query` as a getter, so the parsed query is redefined on the request.
 * The schemas stay readable on the middleware: the API document reads them from the routes.
 */
export function validate(schemas: Schemas): RequestHandler & { schemas: Schemas } {
  const middleware: RequestHandler = (req, _res, next) => {
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part]
      if (!schema) continue
      const result = schema.safeParse(req[part] ?? {})
      if (!result.success) {
        const fields = fieldsOf(result.error.issues)
        const first = Object.values(fields)[0] ?? 'The request is not valid.'
        throw new ValidationError(part === 'body' ? first : `Invalid ${part}: ${first}`, fields)
      }
      Object.defineProperty(req, part, { value: result.data, writable: true, configurable: true, enumerable: true })
    }
    next()
  }
  return Object.assign(middleware, { schemas })
}
