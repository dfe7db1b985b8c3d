import { z } from 'zod'

/** Record ids are PostgreSQL integers; path params arrive as strings. */
export const idParam = z.coerce.number().int().positive()

export const ROLES = ['owner', 'engineer', 'client', 'viewer'] as const
export const roleSchema = z.enum(ROLES)
export type Role = z.infer<typeof roleSchema>

/** Roles from least to most rights: a viewer reads, a client adds captures, an engineer edits, an owner manages. */
const ROLE_ORDER: readonly Role[] = ['viewer', 'client', 'engineer', 'owner']

/** 0 for viewer … 3 for owner: a higher rank has every right of a lower one. */
export function roleRank(role: Role): number {
  return ROLE_ORDER.indexOf(role)
}

/** The body of every error response: `{ error: ApiErrorBody }`. */
export interface ApiErrorBody {
  code: string
  message: string
  /** Field path → message, for validation errors. */
  fields?: Record<string, string>
}
