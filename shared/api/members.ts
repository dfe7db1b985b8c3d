import { z } from 'zod'
import { roleSchema, type Role } from './common'

export const updateMemberBodySchema = z.object({ role: roleSchema })
export type UpdateMemberBody = z.infer<typeof updateMemberBodySchema>

export const addMemberBodySchema = z.object({
  email: z.email('Enter a valid e-mail address.').trim().toLowerCase(),
  role: roleSchema,
})
export type AddMemberBody = z.infer<typeof addMemberBodySchema>

export interface MemberDto {
  userId: number
  name: string
  email: string
  role: Role
}
