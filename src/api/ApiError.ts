import type { ApiErrorBody } from '@shared/api'

/** A failed API call: the server's `{ error: { code, message, fields } }`, or a network failure. */
export class ApiError extends Error {
  readonly status: number
  readonly code: string
  /** Field name (as in the request body) → message, for validation errors. */
  readonly fields: Record<string, string>

  constructor(status: number, body: ApiErrorBody) {
    super(body.message)
    this.name = 'ApiError'
    this.status = status
    this.code = body.code
    this.fields = body.fields ?? {}
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError
}

/** The sentence to show a person for any thrown value. */
export function errorMessage(error: unknown): string {
  if (error instanceof Error && error.message) return error.message
  return 'Something went wrong. Try again, and reload the page if it keeps happening.'
}
