import { z } from 'zod'
import { ROLES, roleRank, roleSchema, type Role } from './common'

export const API_TOKEN_DEFAULT_DAYS = 90
export const API_TOKEN_MAX_DAYS = 365

export const createApiTokenBodySchema = z.object({
  name: z.string().trim().min(1, 'Name the token, e.g. after the rig or script that will use it.').max(120, 'Keep the name under 120 characters.'),
  workspaceId: z.number({ error: 'Choose the workspace the token may reach.' }).int().positive(),
  role: roleSchema,
  expiresInDays: z
    .number({ error: 'The expiry is a number of days.' })
    .int('The expiry is a whole number of days.')
    .min(1, 'A token lasts at least 1 day.')
    .max(API_TOKEN_MAX_DAYS, `A token lasts at most ${API_TOKEN_MAX_DAYS} days; create a new one when it runs out.`)
    .default(API_TOKEN_DEFAULT_DAYS),
})
export type CreateApiTokenBody = z.infer<typeof createApiTokenBodySchema>

export type ApiTokenStatus = 'active' | 'expired' | 'revoked'

export const apiTokenDtoSchema = z
  .object({
    id: z.number().int(),
    name: z.string(),
    workspaceId: z.number().int(),
    workspaceName: z.string(),
    role: roleSchema,
    /** The first characters of the secret, to tell tokens apart. */
    prefix: z.string(),
    status: z.enum(['active', 'expired', 'revoked']),
    createdAt: z.string(),
    expiresAt: z.string(),
    lastUsedAt: z.string().nullable(),
    revokedAt: z.string().nullable(),
    /** Why the token stopped working early, in plain words. */
    revokedReason: z.string().nullable(),
  })
  .meta({ id: 'ApiToken' })
export type ApiTokenDto = z.infer<typeof apiTokenDtoSchema>

export const createdApiTokenSchema = z
  .object({
    token: apiTokenDtoSchema,
    /** The secret itself: shown once, never stored or shown again. */
    secret: z.string(),
  })
  .meta({ id: 'CreatedApiToken' })
export type CreatedApiTokenDto = z.infer<typeof createdApiTokenSchema>

export const apiTokenActivitySchema = z
  .object({ id: z.number().int(), action: z.string(), summary: z.string(), createdAt: z.string() })
  .meta({ id: 'ApiTokenActivity' })
export type ApiTokenActivityDto = z.infer<typeof apiTokenActivitySchema>

/** The roles a member with `role` may give a token: their own and every lower one. */
export function tokenRolesFor(role: Role): Role[] {
  return ROLES.filter((candidate) => roleRank(candidate) <= roleRank(role))
}
