import { z } from 'zod'
import { roleSchema, type Role } from './common'

/** The single-use tokens in e-mailed links: 32 random bytes as base64url (43 characters). */
export const linkTokenParamsSchema = (message: string) => z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, message) })

export const createInvitationBodySchema = z.object({
  email: z.email('Enter a valid e-mail address.').trim().toLowerCase(),
  role: roleSchema,
  /** Invite to one room: a client or viewer then sees that room. */
  roomId: z.number().int().positive().nullable().default(null),
})
export type CreateInvitationBody = z.infer<typeof createInvitationBodySchema>

export interface InvitationDto {
  id: number
  email: string
  role: Role
  roomId: number | null
  expiresAt: string
  acceptedAt: string | null
  createdAt: string
}

/** What an invitation link shows before it is accepted (no account needed). */
export interface InvitationPreviewDto {
  workspaceName: string
  roomName: string | null
  role: Role
  email: string
  expiresAt: string
}

export interface AcceptedInvitationDto {
  workspaceId: number
  roomId: number | null
}

export const passwordResetRequestSchema = z.object({
  email: z.email('Enter a valid e-mail address.').trim().toLowerCase(),
})

export const passwordResetBodySchema = z.object({
  password: z.string().min(10, 'Use at least 10 characters.').max(200),
})

export const createShareLinkBodySchema = z.object({
  surveyIds: z.array(z.number().int().positive()).min(2, 'Choose at least two surveys.').max(6),
  bands: z.enum(['octave', 'third']).default('octave'),
  label: z.string().trim().max(120).default(''),
  /** Days until the link stops working; null = until revoked. */
  expiresInDays: z.number().int().min(1, 'At least one day.').max(365, 'At most a year.').nullable().default(null),
})
export type CreateShareLinkBody = z.infer<typeof createShareLinkBodySchema>

export interface ShareLinkDto {
  id: number
  label: string
  surveyIds: number[]
  bands: 'octave' | 'third'
  /** The frozen report revision the link shows (null: a link made before revisions existed). */
  reportRevisionId: number | null
  revisionNumber: number | null
  expiresAt: string | null
  revokedAt: string | null
  createdAt: string
  /** Only in the answer that created it: the token is not stored, only its hash. */
  url?: string
}

export interface ActivityDto {
  id: number
  action: string
  summary: string
  userName: string | null
  createdAt: string
}

export const sendReportBodySchema = z.object({
  surveyIds: z.array(z.number().int().positive()).min(2, 'Choose at least two surveys.').max(6),
  bands: z.enum(['octave', 'third']).default('octave'),
  recipientEmail: z.email('Enter the client’s e-mail address.').trim().toLowerCase(),
  expiresInDays: z.number().int().min(1).max(365).nullable().default(90),
})
export type SendReportBody = z.infer<typeof sendReportBodySchema>
