import { ROLES, type Role } from '@shared/api'

/** Owners may invite with any role; engineers only clients and viewers (the server answers 403 otherwise). */
export function invitableRoles(inviterRole: Role | null): Role[] {
  if (inviterRole === 'owner') return [...ROLES]
  if (inviterRole === 'engineer') return ['client', 'viewer']
  return []
}
