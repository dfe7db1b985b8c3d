import { NotFoundError } from '../errors'
import { findActingRole } from '../policy/actingMembership'
import type { Role } from '../../shared/api/common'

/** The caller's role in a workspace (capped by an API token's role); a workspace they cannot act in is a 404. */
export async function requireMembershipRole(userId: number, workspaceId: number): Promise<Role> {
  const role = await findActingRole(userId, workspaceId)
  if (!role) throw new NotFoundError('That workspace')
  return role
}
