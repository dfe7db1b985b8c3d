import { z } from 'zod'

/** Record ids are PostgreSQL integers; path params arrive as strings. */
export const idParam = z.coerce.number().int().positive()

export const ROLES = ['owner', 'engineer', 'client', 'viewer'] as const
export const roleSchema = z.enum(ROLES)
export type Role = z.infer<typeof roleSchema>

/** The body of every error response: `{ error: ApiErrorBody }`. */
export interface ApiErrorBody {
  code: string
  message: string
  /** Field path → message, for validation errors. */
  fields?: Record<string, string>
}
