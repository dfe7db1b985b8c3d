import type { Role } from '@shared/api'

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  engineer: 'Engineer',
  client: 'Client',
  viewer: 'Viewer',
}

/** One line on what each role may do, as DESIGN.md describes the roles. */
export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  owner: 'Manages members and everything in the workspace.',
  engineer: 'Creates and edits rooms, surveys and captures.',
  client: 'Sees the rooms shared with them and may add captures.',
  viewer: 'Reads the rooms shared with them.',
}
