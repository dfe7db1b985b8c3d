import { z } from 'zod'

export const workspaceProfileBodySchema = z.object({
  consultancyName: z.string().trim().max(120, 'Keep the name under 120 characters.'),
  address: z.string().trim().max(300, 'Keep the address under 300 characters.'),
  contact: z.string().trim().max(300, 'Keep the contact under 300 characters.'),
})
export type WorkspaceProfileBody = z.infer<typeof workspaceProfileBodySchema>

export interface WorkspaceProfileDto extends WorkspaceProfileBody {
  workspaceId: number
  hasLogo: boolean
  updatedAt: string | null
}

/** Logos are PNG or JPEG images of at most this size (they print on every report's first page). */
export const LOGO_MAX_BYTES = 1024 * 1024
