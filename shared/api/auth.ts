import { z } from 'zod'
import type { Role } from './common'

export const signInBodySchema = z.object({
  email: z.email('Enter a valid e-mail address.').trim().toLowerCase(),
  password: z.string().min(1, 'Enter your password.').max(200),
})
export type SignInBody = z.infer<typeof signInBodySchema>

export const registerBodySchema = z.object({
  name: z.string().trim().min(1, 'Enter your name.').max(120),
  email: z.email('Enter a valid e-mail address.').trim().toLowerCase(),
  password: z.string().min(10, 'Use at least 10 characters.').max(200),
  workspaceName: z.string().trim().max(120).default(''),
  /** Registering from an invitation joins that workspace instead of creating one. */
  invitationToken: z.string().trim().min(20).max(100).optional(),
}).refine((body) => body.invitationToken !== undefined || body.workspaceName.length > 0, { message: 'Name your workspace.', path: ['workspaceName'] })
export type RegisterBody = z.infer<typeof registerBodySchema>

export interface UserDto {
  id: number
  name: string
  email: string
}

export interface MembershipDto {
  workspaceId: number
  workspaceName: string
  role: Role
}

export interface MeResponse {
  user: UserDto
  memberships: MembershipDto[]
}

export interface CsrfResponse {
  csrfToken: string
}
