import { Membership } from '../models'
import { actingRole } from '../auth/actingScope'
import type { Role } from '../../shared/api/common'

/**
 * The role the caller acts with in a workspace, or null when they may not act there at all: not a
 * member, or calling with an API token of another workspace. Every authorisation decision starts here.
 */
export async function findActingRole(userId: number, workspaceId: number): Promise<Role | null> {
  const membership = await Membership.findOne({ where: { userId, workspaceId }, attributes: ['role'] })
  return membership ? actingRole(userId, workspaceId, membership.role) : null
}
