import type { ApiErrorBody, CsrfResponse } from '@shared/api'
import { ApiError } from './ApiError'

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE'

const API_BASE = '/api'
const CSRF_PATH = '/auth/csrf'

let csrfToken: Promise<string> | null = null
let unauthenticatedListener: (() => void) | null = null

/** Drops the cached CSRF token; the next state-changing call fetches a fresh one. */
export function forgetCsrfToken(): void {
  csrfToken = null
}

/** Called when a request other than `GET /auth/me` finds the session gone (e.g. it expired). */
export function onUnauthenticated(listener: (() => void) | null): void {
  unauthenticatedListener = listener
}

/** The session's CSRF token, fetched once and shared by concurrent callers. */
export function getCsrfToken(): Promise<string> {
  if (!csrfToken) {
    const pending = send('GET', CSRF_PATH).then((body) => (body as CsrfResponse).csrfToken)
    pending.catch(() => {
      if (csrfToken === pending) forgetCsrfToken()
    })
    csrfToken = pending
  }
  return csrfToken
}

async function send(method: Method, path: string, body?: unknown, token?: string): Promise<unknown> {
  const headers: Record<string, string> = { accept: 'application/json' }
  if (body !== undefined) headers['content-type'] = 'application/json'
  if (token) headers['x-csrf-token'] = token
  let response: Response
  try {
    response = await fetch(`${API_BASE}${path}`, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : JSON.stringify(body),
    })
  } catch {
    throw new ApiError(0, { code: 'network', message: 'Ringdown cannot reach its server. Check your connection and try again.' })
  }
  if (response.status === 204) return undefined
  const json: unknown = await response.json().catch(() => undefined)
  if (!response.ok) throw toApiError(response.status, json)
  return json
}

/** Our error JSON → ApiError; anything else → an ApiError with a readable message. */
export function toApiError(status: number, json: unknown): ApiError {
  const error = (json as { error?: Partial<ApiErrorBody> } | undefined)?.error
  if (error && typeof error.code === 'string' && typeof error.message === 'string') {
    return new ApiError(status, { code: error.code, message: error.message, fields: error.fields })
  }
  const message = status >= 500
    ? `The server had a problem (HTTP ${status}). Try again in a moment.`
    : `The request was refused (HTTP ${status}).`
  return new ApiError(status, { code: 'http-error', message })
}

/**
 * Calls the API and returns the parsed JSON (undefined for 204). State-changing calls carry the
 * CSRF token; when the server answers 403 `csrf` (the token went stale) the token is fetched
 * again and the call is repeated once.
 */
export async function request<T>(method: Method, path: string, body?: unknown): Promise<T> {
  try {
    if (method === 'GET') return (await send(method, path)) as T
    try {
      return (await send(method, path, body, await getCsrfToken())) as T
    } catch (error) {
      if (!(error instanceof ApiError && error.status === 403 && error.code === 'csrf')) throw error
      forgetCsrfToken()
      return (await send(method, path, body, await getCsrfToken())) as T
    }
  } catch (error) {
    reportIfUnauthenticated(error, path)
    throw error
  }
}

/** Tells the listener when a call other than `GET /auth/me` found the session gone. */
export function reportIfUnauthenticated(error: unknown, path: string): void {
  if (error instanceof ApiError && error.code === 'unauthenticated' && path !== '/auth/me') unauthenticatedListener?.()
}

/** The full URL of an API path, for plain links (downloads) and the upload request. */
export function apiUrl(path: string): string {
  return `${API_BASE}${path}`
}

/** Builds a query string from the defined, non-empty values. */
export function toQuery(params: Record<string, string | undefined>): string {
  const search = new URLSearchParams()
  for (const [key, value] of Object.entries(params)) if (value) search.set(key, value)
  const text = search.toString()
  return text ? `?${text}` : ''
}
